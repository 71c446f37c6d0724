import { setupPaths } from '../../../shared/api/setup-paths';
import { SalonSettingsSchema } from '../../../shared/schemas/salon-settings.schemas';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { writeAudit } from '../audit/audit.repository';
import { readSalonSettings, writeSalonSettings } from './salon-settings.repository';
import { assertServicesWithinNewLimits } from './processing-limits-change';

export function registerSalonSettingsRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: setupPaths.salon, access: ['owner'], summary: "The salon's settings and opening hours", response: SalonSettingsSchema },
    async ({ user }) => readSalonSettings(db, user.salonId),
  );
  apiRoute(
    table,
    { method: 'put', path: setupPaths.salon, access: ['owner'], summary: "Change the salon's settings and opening hours", body: SalonSettingsSchema, response: SalonSettingsSchema },
    async ({ user, body }) =>
      db.transaction().execute(async (trx) => {
        const before = await readSalonSettings(trx, user.salonId);
        await assertServicesWithinNewLimits(trx, user.salonId, before.processingLimits, body.processingLimits);
        await writeSalonSettings(trx, user.salonId, body);
        const after = await readSalonSettings(trx, user.salonId);
        await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: 'salon', entityId: user.salonId, action: 'settings changed', before, after });
        return after;
      }),
  );
}
