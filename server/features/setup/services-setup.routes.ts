import { setupPaths } from '../../../shared/api/setup-paths';
import { IdParamsSchema } from '../../../shared/schemas/common.schemas';
import { ServiceInputSchema, SetupServiceListSchema, SetupServiceSchema } from '../../../shared/schemas/setup.schemas';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { AppError, notFound } from '../../lib/app-error';
import { writeAudit } from '../audit/audit.repository';
import { findSalon } from '../salon/salon.repository';
import { assertWithinProcessingLimits } from '../planning/processing-limits-check';
import { affectedMessage } from './affected-message';
import { uniqueName } from './name-taken';
import { listFutureBookings } from './future-bookings.repository';
import { insertService, listSetupServices, listSkills, retireService, updateService } from './services-setup.repository';

export function registerServiceSetupRoutes({ table, db }: AppDeps): void {
  const one = async (salonId: string, id: string) => {
    const found = (await listSetupServices(db, salonId, new Date())).find((s) => s.id === id);
    if (!found) throw notFound('That service');
    return found;
  };
  apiRoute(
    table,
    { method: 'get', path: setupPaths.services, access: ['owner'], summary: 'Every service, retired ones too, with future bookings counted', response: SetupServiceListSchema },
    async ({ user }) => {
      const [services, skills] = await Promise.all([listSetupServices(db, user.salonId, new Date()), listSkills(db, user.salonId)]);
      return { services, skills };
    },
  );
  apiRoute(
    table,
    { method: 'post', path: setupPaths.services, access: ['owner'], summary: 'Add a service with its step plan', body: ServiceInputSchema, response: SetupServiceSchema, status: 201 },
    async ({ user, body }) => {
      assertWithinProcessingLimits(body.stepPlan, (await findSalon(db, user.salonId)).processingLimits);
      const id = await uniqueName(insertService(db, user.salonId, body), 'service');
      await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: 'service', entityId: id, action: 'added', after: body });
      return one(user.salonId, id);
    },
  );
  apiRoute(
    table,
    { method: 'put', path: '/api/owner/setup/services/:id', access: ['owner'], summary: 'Change a service (bookings already made keep their own copy)', params: IdParamsSchema, body: ServiceInputSchema, response: SetupServiceSchema },
    async ({ user, params, body }) => {
      const before = await one(user.salonId, params.id);
      assertWithinProcessingLimits(body.stepPlan, (await findSalon(db, user.salonId)).processingLimits);
      await uniqueName(updateService(db, user.salonId, params.id, body), 'service');
      await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: 'service', entityId: params.id, action: 'changed', before, after: body });
      return one(user.salonId, params.id);
    },
  );
  apiRoute(
    table,
    { method: 'delete', path: '/api/owner/setup/services/:id', access: ['owner'], summary: 'Take a service off the menu; refused while it has future bookings', params: IdParamsSchema, status: 204 },
    async ({ user, params }) => {
      const service = await one(user.salonId, params.id);
      const salon = await findSalon(db, user.salonId);
      const future = await listFutureBookings(db, user.salonId, { serviceId: params.id }, new Date());
      if (future.length > 0) {
        throw new AppError('CONFLICT', 409, affectedMessage(`${service.name} still has`, future, salon.timeZone) + ' Move or cancel them first.');
      }
      await retireService(db, user.salonId, params.id);
      await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: 'service', entityId: params.id, action: 'taken off the menu', before: service });
    },
  );
}
