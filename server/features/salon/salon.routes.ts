import { salonApi } from '@shared/api/salon.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { salonOf } from './salon.service';

export function registerSalonRoutes({ table, db }: AppDeps): void {
  apiRoute(table, salonApi.current, async ({ user }) => salonOf(db, user));
}
