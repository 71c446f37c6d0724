import { apiPaths } from '../../../shared/api/api-paths';
import { IdParamsSchema } from '../../../shared/schemas/common.schemas';
import { CreateStandbySchema, StandbyEntrySchema, StandbyListSchema } from '../../../shared/schemas/standby.schemas';
import type { AppDeps } from '../../app-deps';
import { DESK, STAFF } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { AppError, notFound } from '../../lib/app-error';
import { findClient } from '../clients/clients.repository';
import { listServices } from '../services/services.repository';
import { listStylists } from '../bookings/salon-resources.repository';
import { writeAudit } from '../audit/audit.repository';
import { closeStandby, insertStandby, listStandby } from './standby.repository';

export function registerStandbyRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: apiPaths.standby, access: STAFF, summary: 'The standby list', response: StandbyListSchema },
    async ({ user }) => ({ entries: await listStandby(db, user.salonId) }),
  );
  apiRoute(
    table,
    { method: 'post', path: apiPaths.standby, access: DESK, summary: 'Add a client to the standby list', body: CreateStandbySchema, response: StandbyEntrySchema, status: 201 },
    async ({ user, body }) => {
      // Every id must belong to this salon; a foreign id is answered as a field error, not stored.
      const [client, services, stylists] = await Promise.all([findClient(db, user.salonId, body.clientId), listServices(db, user.salonId), listStylists(db, user.salonId)]);
      const fields: Record<string, string> = {};
      if (!client) fields.clientId = 'No such client in this salon.';
      if (body.serviceIds.some((id) => !services.some((s) => s.id === id))) fields.serviceIds = 'Pick services of this salon.';
      if (body.stylistId && !stylists.some((s) => s.id === body.stylistId)) fields.stylistId = 'No such stylist in this salon.';
      if (Object.keys(fields).length) throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', fields);
      const id = await insertStandby(db, user.salonId, { ...body, notes: body.notes ?? '' }, user.id);
      await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: 'standby_entry', entityId: id, action: 'added', after: body });
      return (await listStandby(db, user.salonId, id))[0];
    },
  );
  apiRoute(
    table,
    { method: 'delete', path: '/api/standby/:id', access: DESK, summary: 'Take a client off the standby list', params: IdParamsSchema, status: 204 },
    async ({ user, params }) => {
      if (!(await closeStandby(db, user.salonId, params.id))) throw notFound('That standby entry');
      await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: 'standby_entry', entityId: params.id, action: 'removed' });
    },
  );
}
