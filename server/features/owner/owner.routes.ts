import { apiPaths } from '../../../shared/api/api-paths';
import { OwnerOverviewSchema } from '../../../shared/schemas/owner.schemas';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { findSalon } from '../salon/salon.repository';
import { ownerOverview } from './owner-overview.service';

export function registerOwnerRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: apiPaths.ownerOverview, access: ['owner'], summary: 'What the salon has and how this week is used', response: OwnerOverviewSchema },
    async ({ user }) => ownerOverview(db, await findSalon(db, user.salonId), new Date()),
  );
}
