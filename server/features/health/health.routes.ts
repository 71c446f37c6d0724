import { sql } from 'kysely';
import { z } from 'zod';
import { apiPaths } from '../../../shared/api/api-paths';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';

const HealthSchema = z.object({ ok: z.boolean(), db: z.enum(['up', 'down']) });

export function registerHealthRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: apiPaths.health, access: 'public', summary: 'Is the app and its database up', response: HealthSchema },
    async ({ res }) => {
      try {
        await sql`select 1`.execute(db);
        return { ok: true, db: 'up' };
      } catch {
        // The pool reconnects by itself once PostgreSQL is back; until then say so with 503.
        res.status(503);
        return { ok: false, db: 'down' };
      }
    },
  );
}
