import { typicalMinutesApi } from '@shared/api/typical-minutes.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { typicalMinutesFor } from './typical-minutes.service';

export function registerTypicalMinutesRoutes({ table, db }: AppDeps): void {
  apiRoute(table, typicalMinutesApi.forService, ({ user, params, query }) => typicalMinutesFor(db, user, params.id, query.stylistId));
}
