import { ownerApi } from '@shared/api/owner.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { ownerOverview } from './owner-overview.service';

export function registerOwnerRoutes({ table, db }: AppDeps): void {
  apiRoute(table, ownerApi.overview, async ({ user }) => ownerOverview(db, user.salonId, new Date()));
}
