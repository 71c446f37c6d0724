import { photoPaths } from '../../../shared/api/hair-paths';
import type { SessionUser } from '../../../shared/schemas/auth.schemas';
import { IdParamsSchema } from '../../../shared/schemas/common.schemas';
import { PHOTO_LIMITS, PhotoListSchema, PhotoUploadFieldsSchema } from '../../../shared/schemas/photo.schemas';
import type { AppDeps } from '../../app-deps';
import { CLIENT_OR_STAFF, clientIdFor, myClientId } from '../../auth/client-access';
import { STAFF } from '../../auth/require-access';
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
  url: photoPaths.one(p.id),
});

// Decoding and re-encoding is the expensive part: a person gets a generous budget per quarter hour,
// counted per signed-in user so a busy salon behind one address is not throttled as one.
const uploadLimiter = rateLimited({
  windowMs: 15 * 60_000,
  limit: 60,
  key: (req) => (req.user as SessionUser).id,
  message: 'Too many uploads; try again in a few minutes.',
});

const uploadSpec = {
  access: ['client'] as const,
  fileField: 'photos',
  maxFiles: PHOTO_LIMITS.filesPerRequest,
  maxBytesPerFile: PHOTO_LIMITS.bytesPerFile,
  fields: PhotoUploadFieldsSchema,
  response: PhotoListSchema,
  before: [uploadLimiter],
};

export function registerPhotoRoutes(deps: AppDeps): void {
  const { table, db, storage } = deps;
  const upload = (user: SessionUser, clientId: string, fields: { kind: 'hair_now' | 'wanted'; bookingId?: string }, files: Express.Multer.File[]) =>
    storePhotos(db, storage, { salonId: user.salonId, clientId, bookingId: fields.bookingId ?? null, kind: fields.kind, files }).then((rows) => ({ photos: rows.map(toView) }));

  uploadRoute(
    table,
    { ...uploadSpec, path: photoPaths.mine, summary: 'The signed-in client adds photos (hair now, or what they want)' },
    async ({ user, fields, files }) => upload(user, await myClientId(db, user), fields, files),
  );
  uploadRoute(
    table,
    { ...uploadSpec, access: STAFF, path: '/api/clients/:id/photos', params: IdParamsSchema, summary: 'The salon’s team adds photos to a client' },
    async ({ user, params, fields, files }) => upload(user, await clientIdFor(db, user, params.id), fields, files),
  );
  apiRoute(
    table,
    { method: 'get', path: photoPaths.mine, access: ['client'], summary: 'The signed-in client’s photos', response: PhotoListSchema },
    async ({ user }) => ({ photos: (await listPhotos(db, await myClientId(db, user))).map(toView) }),
  );
  apiRoute(
    table,
    { method: 'get', path: '/api/clients/:id/photos', access: CLIENT_OR_STAFF, summary: 'A client’s photos (the client or their salon’s team)', params: IdParamsSchema, response: PhotoListSchema },
    async ({ user, params }) => ({ photos: (await listPhotos(db, await clientIdFor(db, user, params.id))).map(toView) }),
  );
  registerPhotoFileRoutes(deps);
}
