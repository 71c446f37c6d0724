import { takingsApi } from '@shared/api/takings.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { closeDay, reopenDay, takingsFor } from './takings.service';

/** The day's takings and its close at the desk. */
export function registerTakingsRoutes({ table, db }: AppDeps): void {
  apiRoute(table, takingsApi.day, ({ user, query }) => takingsFor(db, user, query.date));
  apiRoute(table, takingsApi.close, ({ user, body }) => closeDay(db, user, body, new Date()));
  apiRoute(table, takingsApi.reopen, ({ user, body }) => reopenDay(db, user, body.date, new Date()));
}
