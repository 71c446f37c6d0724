import { appApi } from '@shared/api/app.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { checkHealth } from './health.service';

export function registerHealthRoutes({ table, db }: AppDeps): void {
  apiRoute(table, appApi.health, async ({ res }) => {
    const health = await checkHealth(db);
    // The pool reconnects by itself once PostgreSQL is back; until then say so with 503.
    if (!health.ok) res.status(503);
    return health;
  });
}
