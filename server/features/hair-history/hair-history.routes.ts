import { IdParamsSchema } from '../../../shared/schemas/common.schemas';
import { HairHistoryResponseSchema, HairHistorySchema } from '../../../shared/schemas/hair-history.schemas';
import type { AppDeps } from '../../app-deps';
import { CLIENT_OR_STAFF, clientIdFor, myClientId } from '../../auth/client-access';
import { apiRoute } from '../../lib/api-route';
import { findHairHistory, saveHairHistory } from './hair-history.repository';

export function registerHairHistoryRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: '/api/me/hair-history', access: ['client'], summary: 'The signed-in client’s hair history', response: HairHistoryResponseSchema },
    async ({ user }) => findHairHistory(db, await myClientId(db, user)),
  );
  apiRoute(
    table,
    { method: 'put', path: '/api/me/hair-history', access: ['client'], summary: 'Save the signed-in client’s hair history', body: HairHistorySchema, response: HairHistoryResponseSchema },
    async ({ user, body }) => saveHairHistory(db, await myClientId(db, user), body),
  );
  apiRoute(
    table,
    { method: 'get', path: '/api/clients/:id/hair-history', access: CLIENT_OR_STAFF, summary: 'A client’s hair history (the client or their salon’s team)', params: IdParamsSchema, response: HairHistoryResponseSchema },
    async ({ user, params }) => findHairHistory(db, await clientIdFor(db, user, params.id)),
  );
  apiRoute(
    table,
    { method: 'put', path: '/api/clients/:id/hair-history', access: CLIENT_OR_STAFF, summary: 'Save a client’s hair history (the client or their salon’s team)', params: IdParamsSchema, body: HairHistorySchema, response: HairHistoryResponseSchema },
    async ({ user, params, body }) => saveHairHistory(db, await clientIdFor(db, user, params.id), body),
  );
}
