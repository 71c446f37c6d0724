import { catalogueApi } from '@shared/api/catalogue.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { salonServices, salonStylists } from './catalogue.service';

export function registerServiceRoutes({ table, db }: AppDeps): void {
  apiRoute(table, catalogueApi.services, ({ user }) => salonServices(db, user));
  apiRoute(table, catalogueApi.stylists, ({ user }) => salonStylists(db, user));
}
