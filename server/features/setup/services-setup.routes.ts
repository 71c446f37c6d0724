import { setupApi } from '@shared/api/setup.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { addService, changeService, setupServices, takeServiceOffMenu } from './services-setup.service';

export function registerServiceSetupRoutes({ table, db }: AppDeps): void {
  apiRoute(table, setupApi.services, async ({ user }) => setupServices(db, user.salonId, new Date()));
  apiRoute(table, setupApi.addService, async ({ user, body }) => addService(db, user, body));
  apiRoute(table, setupApi.saveService, async ({ user, params, body }) => changeService(db, user, params.id, body));
  apiRoute(table, setupApi.retireService, async ({ user, params }) => takeServiceOffMenu(db, user, params.id));
}
