import { photosApi } from '@shared/api/photos.api';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { rateLimited } from '@server/lib/rate-limit';
import { uploadRoute } from '@server/lib/upload-route';
import { addPhotos, photoFile, photoList, removePhoto } from './photos.service';

export function registerPhotoRoutes({ table, db, storage }: AppDeps): void {
  // Decoding and re-encoding is the expensive part: a person gets a generous budget per quarter hour,
  // counted per signed-in user so a busy salon behind one address is not throttled as one.
  const uploadLimiter = rateLimited(db, {
    name: 'uploads',
    windowMs: 15 * 60_000,
    limit: 60,
    key: (req) => (req.user as SessionUser).id,
    message: 'Too many uploads; try again in a few minutes.',
  });
  uploadRoute(table, photosApi.addMine, ({ user, fields, files }) => addPhotos(db, storage, user, 'me', fields, files), [uploadLimiter]);
  uploadRoute(table, photosApi.addToClient, ({ user, params, fields, files }) => addPhotos(db, storage, user, { clientId: params.id }, fields, files), [
    uploadLimiter,
  ]);
  apiRoute(table, photosApi.mine, ({ user }) => photoList(db, user, 'me'));
  apiRoute(table, photosApi.ofClient, ({ user, params }) => photoList(db, user, { clientId: params.id }));
  apiRoute(table, photosApi.file, async ({ user, params, res }) => {
    const { mime, bytes } = await photoFile(db, storage, user, params.id);
    // Private: personal photos must not sit in shared caches; nosniff so the bytes are only ever an image.
    res
      .status(200)
      .set({ 'Content-Type': mime, 'Cache-Control': 'private, max-age=3600', 'X-Content-Type-Options': 'nosniff', 'Content-Disposition': 'inline' })
      .end(bytes);
  });
  apiRoute(table, photosApi.remove, ({ user, params }) => removePhoto(db, storage, user, params.id));
}
