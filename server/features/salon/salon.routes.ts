import { salonApi } from '../../../shared/api/salon.api';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { salonOf } from './salon.service';

export function registerSalonRoutes({ table, db }: AppDeps): void {
  apiRoute(table, salonApi.current, async ({ user }) => salonOf(db, user));
}
