import { urlOf } from '@shared/api/endpoint';
import { photosApi } from '@shared/api/photos.api';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { PhotoKind, Photo as PhotoView } from '@shared/schemas/photo.schemas';
import type { Db } from '@server/db/database';
import { clientIdFor, myClientId } from '@server/auth/client-access';
import { notFound } from '@server/lib/app-error';
import type { Storage } from '@server/storage/storage';
import { writeAudit } from '../audit';
import { strandTestsShowingPhoto } from '../strand-tests';
import { deletePhoto, findPhoto, isOwnClientRecord, listPhotos, type Photo } from './photos.repository';
import { storePhotos } from './store-photos.service';

/** Whose photos: the signed-in client's own, or one client's as the salon's team sees them. */
export type PhotoOwner = 'me' | { clientId: string };

const ownerClientId = (db: Db, user: SessionUser, owner: PhotoOwner) => (owner === 'me' ? myClientId(db, user) : clientIdFor(db, user, owner.clientId));

const toView = (p: Photo): PhotoView => ({
  id: p.id,
  kind: p.kind,
  bookingId: p.bookingId,
  width: p.width,
  height: p.height,
  createdAt: p.createdAt.toISOString(),
  url: urlOf(photosApi.file, { params: { id: p.id } }),
});

export async function photoList(db: Db, user: SessionUser, owner: PhotoOwner) {
  return { photos: (await listPhotos(db, await ownerClientId(db, user, owner))).map(toView) };
}

export async function addPhotos(
  db: Db,
  storage: Storage,
  user: SessionUser,
  owner: PhotoOwner,
  fields: { kind: PhotoKind; bookingId?: string },
  files: { originalname: string; buffer: Buffer }[],
) {
  const clientId = await ownerClientId(db, user, owner);
  const stored = await storePhotos(db, storage, { salonId: user.salonId, clientId, bookingId: fields.bookingId ?? null, kind: fields.kind, files });
  return { photos: stored.map(toView) };
}

/** The photo, if this user may see it: their own as a client, or their salon's as staff; else 404. */
async function visiblePhoto(db: Db, user: SessionUser, id: string): Promise<Photo> {
  const photo = await findPhoto(db, id);
  if (!photo || photo.salonId !== user.salonId) throw notFound('That photo');
  if (user.role === 'client' && !(await isOwnClientRecord(db, photo.clientId, user.id))) throw notFound('That photo');
  return photo;
}

export async function photoFile(db: Db, storage: Storage, user: SessionUser, id: string) {
  const photo = await visiblePhoto(db, user, id);
  const bytes = await storage.get(photo.storageKey);
  if (!bytes) throw notFound('That photo');
  return { mime: photo.mime, bytes };
}

/**
 * Row first: if removing the file then fails, an orphan file is harmless; a row without a file is not.
 * A strand test that showed the photo stays on record without it, and its audit log says so.
 */
export async function removePhoto(db: Db, storage: Storage, user: SessionUser, id: string) {
  const photo = await visiblePhoto(db, user, id);
  await db.transaction().execute(async (trx) => {
    for (const test of await strandTestsShowingPhoto(trx, photo.id)) {
      await writeAudit(trx, {
        salonId: test.salonId,
        actorUserId: user.id,
        entity: 'strand_test',
        entityId: test.id,
        action: 'photo removed',
        before: { photoId: photo.id },
        after: { photoId: null },
      });
    }
    await deletePhoto(trx, photo.id);
  });
  await storage.delete(photo.storageKey);
}
