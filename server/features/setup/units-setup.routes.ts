import { setupApi } from '@shared/api/setup.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { addUnit, backInService, renameUnitOf, takeOutOfService, unitAffected, unitsOf } from './units-setup.service';

export function registerUnitSetupRoutes({ table, db }: AppDeps): void {
  apiRoute(table, setupApi.units, async ({ user }) => unitsOf(db, user.salonId, new Date()));
  apiRoute(table, setupApi.addUnit, async ({ user, params, body }) => addUnit(db, user, params.kind, body.name));
  apiRoute(table, setupApi.renameUnit, async ({ user, params, body }) => renameUnitOf(db, user, params.kind, params.id, body.name));
  apiRoute(table, setupApi.unitAffected, async ({ user, params, query }) => unitAffected(db, user.salonId, params.kind, params.id, query));
  apiRoute(table, setupApi.takeOutOfService, async ({ user, params, body }) => takeOutOfService(db, user, params.kind, params.id, body));
  apiRoute(table, setupApi.backInService, async ({ user, params }) => backInService(db, user.salonId, params.kind, params.id, params.entryId));
}
