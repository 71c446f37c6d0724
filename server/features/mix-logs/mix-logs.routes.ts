import { IdParamsSchema } from '../../../shared/schemas/common.schemas';
import { MixLogListSchema, MixLogSchema, RepeatMixLogResultSchema, RepeatMixLogSchema, WriteMixLogSchema } from '../../../shared/schemas/mix-log.schemas';
import type { AppDeps } from '../../app-deps';
import { STAFF } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { mixLogList, repeatMixLog, writeMixLog } from './mix-logs.service';

// Desk, owner and stylists may call these; the service narrows a stylist to the bookings they work on.
export function registerMixLogRoutes({ table, db }: AppDeps): void {
  apiRoute(
    table,
    { method: 'get', path: '/api/bookings/:id/mix-logs', access: STAFF, summary: "A booking's mix logs, with grams and estimated cost per product (developer apart) per sitting", params: IdParamsSchema, response: MixLogListSchema },
    ({ user, params }) => mixLogList(db, user, params.id, new Date()),
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/bookings/:id/mix-logs', access: STAFF, summary: 'Write one bowl of a sitting (before it starts too; not for a cancelled booking)', params: IdParamsSchema, body: WriteMixLogSchema, response: MixLogSchema, status: 201 },
    ({ user, params, body }) => writeMixLog(db, user, params.id, body),
  );
  apiRoute(
    table,
    { method: 'post', path: '/api/bookings/:id/mix-logs/repeat', access: STAFF, summary: "Copy an earlier sitting's bowls of the same client into a sitting of this booking", params: IdParamsSchema, body: RepeatMixLogSchema, response: RepeatMixLogResultSchema, status: 201 },
    ({ user, params, body }) => repeatMixLog(db, user, params.id, body),
  );
}
