import { apiPaths } from '../../../shared/api/api-paths';
import { ServiceListSchema, StylistListSchema } from '../../../shared/schemas/service.schemas';
import type { AppDeps } from '../../app-deps';
import { STAFF } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { listServices, listStylistDetails } from './services.repository';

export function registerServiceRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: apiPaths.services, access: STAFF, summary: "The salon's services with their step plans", response: ServiceListSchema },
    async ({ user }) => ({ services: await listServices(db, user.salonId) }),
  );
  apiRoute(
    table,
    { method: 'get', path: apiPaths.stylists, access: STAFF, summary: "The salon's stylists with skills", response: StylistListSchema },
    async ({ user }) => ({ stylists: await listStylistDetails(db, user.salonId) }),
  );
}
