import { IdParamsSchema } from '../schemas/common.schemas';
import { PHOTO_LIMITS, PhotoListSchema, PhotoUploadFieldsSchema } from '../schemas/photo.schemas';
import { CLIENT_OR_STAFF, STAFF, endpoint } from './endpoint';

const upload = { fileField: 'photos', maxFiles: PHOTO_LIMITS.filesPerRequest, maxBytesPerFile: PHOTO_LIMITS.bytesPerFile };

/** Photos of a client's hair: added by the client or the team, read and removed by either. */
export const photosApi = {
  mine: endpoint({ method: 'get', path: '/api/me/photos', access: ['client'], summary: 'The signed-in client’s photos', response: PhotoListSchema }),
  addMine: endpoint({
    method: 'post',
    path: '/api/me/photos',
    access: ['client'],
    summary: 'The signed-in client adds photos (hair now, or what they want)',
    bodyType: 'multipart',
    body: PhotoUploadFieldsSchema,
    upload,
    response: PhotoListSchema,
    status: 201,
  }),
  ofClient: endpoint({
    method: 'get',
    path: '/api/clients/:id/photos',
    access: CLIENT_OR_STAFF,
    summary: 'A client’s photos (the client or their salon’s team)',
    params: IdParamsSchema,
    response: PhotoListSchema,
  }),
  addToClient: endpoint({
    method: 'post',
    path: '/api/clients/:id/photos',
    access: STAFF,
    summary: 'The salon’s team adds photos to a client',
    params: IdParamsSchema,
    bodyType: 'multipart',
    body: PhotoUploadFieldsSchema,
    upload,
    response: PhotoListSchema,
    status: 201,
  }),
  file: endpoint({
    method: 'get',
    path: '/api/photos/:id',
    access: CLIENT_OR_STAFF,
    summary: 'The image bytes of one photo (the client or their salon’s team)',
    params: IdParamsSchema,
    answers: 'file',
  }),
  remove: endpoint({
    method: 'delete',
    path: '/api/photos/:id',
    access: CLIENT_OR_STAFF,
    summary: 'Remove a photo (the client or their salon’s team)',
    params: IdParamsSchema,
    status: 204,
  }),
};
