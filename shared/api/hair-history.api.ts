import { IdParamsSchema } from '../schemas/common.schemas';
import { HairHistoryResponseSchema, HairHistorySchema } from '../schemas/hair-history.schemas';
import { CLIENT_OR_STAFF, endpoint } from './endpoint';

/** A client's hair history: filled in by the client on their page, or by the team on the client card. */
export const hairHistoryApi = {
  mine: endpoint({
    method: 'get',
    path: '/api/me/hair-history',
    access: ['client'],
    summary: 'The signed-in client’s hair history',
    response: HairHistoryResponseSchema,
  }),
  saveMine: endpoint({
    method: 'put',
    path: '/api/me/hair-history',
    access: ['client'],
    summary: 'Save the signed-in client’s hair history',
    body: HairHistorySchema,
    response: HairHistoryResponseSchema,
  }),
  ofClient: endpoint({
    method: 'get',
    path: '/api/clients/:id/hair-history',
    access: CLIENT_OR_STAFF,
    summary: 'A client’s hair history (the client or their salon’s team)',
    params: IdParamsSchema,
    response: HairHistoryResponseSchema,
  }),
  saveOfClient: endpoint({
    method: 'put',
    path: '/api/clients/:id/hair-history',
    access: CLIENT_OR_STAFF,
    summary: 'Save a client’s hair history (the client or their salon’s team)',
    params: IdParamsSchema,
    body: HairHistorySchema,
    response: HairHistoryResponseSchema,
  }),
};
