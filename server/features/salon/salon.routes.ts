import { apiPaths } from '../../../shared/api/api-paths';
import { SalonSchema } from '../../../shared/schemas/salon.schemas';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { findSalon } from './salon.repository';

export function registerSalonRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: apiPaths.salon, access: 'signed_in', summary: "The signed-in user's salon", response: SalonSchema },
    async ({ user }) => findSalon(db, user.salonId),
  );
}
