import { DateTime } from 'luxon';
import { setupPaths } from '../../../shared/api/setup-paths';
import { IdSchema } from '../../../shared/schemas/common.schemas';
import {
  AffectedBookingListSchema,
  DayPeriodQuerySchema,
  OutOfServiceInputSchema,
  UnitKindParamsSchema,
  UnitListSchema,
  UnitNameSchema,
  UnitParamsSchema,
  type UnitKind,
} from '../../../shared/schemas/setup.schemas';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { notFound } from '../../lib/app-error';
import { writeAudit } from '../audit/audit.repository';
import { findSalon } from '../salon/salon.repository';
import { withFreeStylists } from './free-stylists.service';
import { listFutureBookings } from './future-bookings.repository';
import { uniqueName } from './name-taken';
import { deleteOutOfService, insertOutOfService, insertUnit, listUnits, renameUnit, unitExists } from './units-setup.repository';

const ClosureParamsSchema = UnitParamsSchema.extend({ entryId: IdSchema });
const singular = (kind: UnitKind) => (kind === 'chairs' ? 'chair' : 'basin');

export function registerUnitSetupRoutes({ table, db }: AppDeps): void {
  const assertUnit = async (salonId: string, kind: UnitKind, id: string) => {
    if (!(await unitExists(db, salonId, kind, id))) throw notFound(`That ${singular(kind)}`);
  };
  /** Whole days in salon time: from 00:00 of the first to 00:00 after the last. */
  const period = async (salonId: string, from: string, to: string) => {
    const salon = await findSalon(db, salonId);
    return { salon, start: DateTime.fromISO(from, { zone: salon.timeZone }).toJSDate(), end: DateTime.fromISO(to, { zone: salon.timeZone }).plus({ days: 1 }).toJSDate() };
  };
  const affected = async (salonId: string, kind: UnitKind, id: string, from: string, to: string) => {
    const { salon, start, end } = await period(salonId, from, to);
    const filter = kind === 'chairs' ? { chairId: id, during: [start, end] as [Date, Date] } : { basinId: id, during: [start, end] as [Date, Date] };
    const now = new Date();
    return withFreeStylists(db, salonId, salon.timeZone, await listFutureBookings(db, salonId, filter, now), now);
  };

  apiRoute(
    table,
    { method: 'get', path: setupPaths.units, access: ['owner'], summary: 'Chairs and basins with their out-of-service periods', response: UnitListSchema },
    async ({ user }) => listUnits(db, user.salonId, new Date()),
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/owner/setup/units/:kind', access: ['owner'], summary: 'Add a chair or basin', params: UnitKindParamsSchema, body: UnitNameSchema, response: UnitListSchema, status: 201 },
    async ({ user, params, body }) => {
      const id = await uniqueName(insertUnit(db, user.salonId, params.kind, body.name), singular(params.kind));
      await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: singular(params.kind), entityId: id, action: 'added', after: body });
      return listUnits(db, user.salonId, new Date());
    },
  );
  apiRoute(
    table,
    { method: 'put', path: '/api/owner/setup/units/:kind/:id', access: ['owner'], summary: 'Rename a chair or basin', params: UnitParamsSchema, body: UnitNameSchema, response: UnitListSchema },
    async ({ user, params, body }) => {
      await assertUnit(user.salonId, params.kind, params.id);
      await uniqueName(renameUnit(db, user.salonId, params.kind, params.id, body.name), singular(params.kind));
      await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: singular(params.kind), entityId: params.id, action: 'renamed', after: body });
      return listUnits(db, user.salonId, new Date());
    },
  );
  apiRoute(
    table,
    { method: 'get', path: '/api/owner/setup/units/:kind/:id/affected', access: ['owner'], summary: 'Future bookings that use a chair or basin during a period', params: UnitParamsSchema, query: DayPeriodQuerySchema, response: AffectedBookingListSchema },
    async ({ user, params, query }) => {
      await assertUnit(user.salonId, params.kind, params.id);
      return { bookings: await affected(user.salonId, params.kind, params.id, query.from, query.to) };
    },
  );
  apiRoute(
    table,
    {
      method: 'post', path: '/api/owner/setup/units/:kind/:id/out-of-service', access: ['owner'],
      summary: 'Take a chair or basin out of service for whole days; answers the future bookings that still use it',
      params: UnitParamsSchema, body: OutOfServiceInputSchema, response: AffectedBookingListSchema, status: 201,
    },
    async ({ user, params, body }) => {
      await assertUnit(user.salonId, params.kind, params.id);
      const { start, end } = await period(user.salonId, body.from, body.to);
      await insertOutOfService(db, user.salonId, params.kind, params.id, start, end, body.reason);
      await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: singular(params.kind), entityId: params.id, action: 'out of service', after: body });
      return { bookings: await affected(user.salonId, params.kind, params.id, body.from, body.to) };
    },
  );
  apiRoute(
    table,
    { method: 'delete', path: '/api/owner/setup/units/:kind/:id/out-of-service/:entryId', access: ['owner'], summary: 'Put a chair or basin back in service', params: ClosureParamsSchema, status: 204 },
    async ({ user, params }) => {
      if (!(await deleteOutOfService(db, user.salonId, params.kind, params.id, params.entryId))) throw notFound('That out-of-service period');
    },
  );
}
