import { standbyApi } from '@shared/api/standby.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { addStandby, removeStandby, standbyList } from './standby.service';

export function registerStandbyRoutes({ table, db }: AppDeps): void {
  apiRoute(table, standbyApi.list, ({ user }) => standbyList(db, user));
  apiRoute(table, standbyApi.add, ({ user, body }) => addStandby(db, user, body));
  apiRoute(table, standbyApi.remove, ({ user, params }) => removeStandby(db, user, params.id));
}
