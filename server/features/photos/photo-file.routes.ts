import type { SessionUser } from '../../../shared/schemas/auth.schemas';
import { photosApi } from '../../../shared/api/photos.api';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { notFound } from '../../lib/app-error';
import type { Db } from '../../db/database';
import { deletePhoto, findPhoto } from './photos.repository';
import { writeAudit } from '../audit/audit.repository';
import { strandTestsShowingPhoto } from '../strand-tests/strand-tests.repository';

/** The photo, if this user may see it: their own as a client, or their salon's as staff; else 404. */
async function visiblePhoto(db: Db, user: SessionUser, id: string) {
  const photo = await findPhoto(db, id);
  if (!photo || photo.salon_id !== user.salonId) throw notFound('That photo');
  if (user.role === 'client') {
    const own = await db.selectFrom('clients').select('id').where('id', '=', photo.client_id).where('user_id', '=', user.id).executeTakeFirst();
    if (!own) throw notFound('That photo');
  }
  return photo;
}

export function registerPhotoFileRoutes({ table, db, storage }: AppDeps): void {
  apiRoute(
    table,
    photosApi.file,
    async ({ user, params, res }) => {
      const photo = await visiblePhoto(db, user, params.id);
      const bytes = await storage.get(photo.storage_key);
      if (!bytes) throw notFound('That photo');
      // Private: personal photos must not sit in shared caches; nosniff so the bytes are only ever an image.
      res
        .status(200)
        .set({ 'Content-Type': photo.mime, 'Cache-Control': 'private, max-age=3600', 'X-Content-Type-Options': 'nosniff', 'Content-Disposition': 'inline' })
        .end(bytes);
    },
  );
  apiRoute(
    table,
    photosApi.remove,
    async ({ user, params }) => {
      const photo = await visiblePhoto(db, user, params.id);
      // Row first: if removing the file then fails, an orphan file is harmless; a row without a file is not.
      // A strand test that showed the photo stays on record without it, and its audit log says so.
      await db.transaction().execute(async (trx) => {
        for (const test of await strandTestsShowingPhoto(trx, photo.id)) {
          await writeAudit(trx, { salonId: test.salonId, actorUserId: user.id, entity: 'strand_test', entityId: test.id, action: 'photo removed', before: { photoId: photo.id }, after: { photoId: null } });
        }
        await deletePhoto(trx, photo.id);
      });
      await storage.delete(photo.storage_key);
    },
  );
}
