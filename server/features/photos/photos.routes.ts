import { urlOf } from '../../../shared/api/endpoint';
import { photosApi } from '../../../shared/api/photos.api';
import type { SessionUser } from '../../../shared/schemas/auth.schemas';
import type { AppDeps } from '../../app-deps';
import { clientIdFor, myClientId } from '../../auth/client-access';
import { apiRoute } from '../../lib/api-route';
import { rateLimited } from '../../lib/rate-limit';
import { uploadRoute } from '../../lib/upload-route';
import { listPhotos, type PhotoRow } from './photos.repository';
import { storePhotos } from './store-photos.service';
import { registerPhotoFileRoutes } from './photo-file.routes';


const toView = (p: Omit<PhotoRow, 'storage_key' | 'mime' | 'salon_id' | 'client_id'>) => ({
  id: p.id,
  kind: p.kind,
  bookingId: p.booking_id,
  width: p.width,
  height: p.height,
  createdAt: p.created_at.toISOString(),
  url: urlOf(photosApi.file, { params: { id: p.id } }),
});

// Decoding and re-encoding is the expensive part: a person gets a generous budget per quarter hour,
// counted per signed-in user so a busy salon behind one address is not throttled as one.
const uploadLimiter = rateLimited({
  windowMs: 15 * 60_000,
  limit: 60,
  key: (req) => (req.user as SessionUser).id,
  message: 'Too many uploads; try again in a few minutes.',
});

export function registerPhotoRoutes(deps: AppDeps): void {
  const { table, db, storage } = deps;
  const upload = (user: SessionUser, clientId: string, fields: { kind: 'hair_now' | 'wanted'; bookingId?: string }, files: Express.Multer.File[]) =>
    storePhotos(db, storage, { salonId: user.salonId, clientId, bookingId: fields.bookingId ?? null, kind: fields.kind, files }).then((rows) => ({ photos: rows.map(toView) }));

  uploadRoute(table, photosApi.addMine, async ({ user, fields, files }) => upload(user, await myClientId(db, user), fields, files), [uploadLimiter]);
  uploadRoute(table, photosApi.addToClient, async ({ user, params, fields, files }) => upload(user, await clientIdFor(db, user, params.id), fields, files), [uploadLimiter]);
  apiRoute(table, photosApi.mine, async ({ user }) => ({ photos: (await listPhotos(db, await myClientId(db, user))).map(toView) }));
  apiRoute(table, photosApi.ofClient, async ({ user, params }) => ({ photos: (await listPhotos(db, await clientIdFor(db, user, params.id))).map(toView) }));
  registerPhotoFileRoutes(deps);
}
