import { hairHistoryApi } from '@shared/api/hair-history.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { clientHairHistory, myHairHistory, saveClientHairHistory, saveMyHairHistory } from './hair-history.service';

export function registerHairHistoryRoutes({ table, db }: AppDeps): void {
  apiRoute(table, hairHistoryApi.mine, ({ user }) => myHairHistory(db, user));
  apiRoute(table, hairHistoryApi.saveMine, ({ user, body }) => saveMyHairHistory(db, user, body));
  apiRoute(table, hairHistoryApi.ofClient, ({ user, params }) => clientHairHistory(db, user, params.id));
  apiRoute(table, hairHistoryApi.saveOfClient, ({ user, params, body }) => saveClientHairHistory(db, user, params.id, body));
}
