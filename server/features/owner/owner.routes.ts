import { ownerApi } from '../../../shared/api/owner.api';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { ownerOverview } from './owner-overview.service';

export function registerOwnerRoutes({ table, db }: AppDeps): void {
  apiRoute(table, ownerApi.overview, async ({ user }) => ownerOverview(db, user.salonId, new Date()));
}
