import { setupApi } from '@shared/api/setup.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { salonSettings, saveSalonSettings } from './salon-settings.service';

export function registerSalonSettingsRoutes({ table, db }: AppDeps): void {
  apiRoute(table, setupApi.salon, async ({ user }) => salonSettings(db, user.salonId));
  apiRoute(table, setupApi.saveSalon, async ({ user, body }) => saveSalonSettings(db, user, body));
}
