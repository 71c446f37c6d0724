import { IdParamsSchema } from '../schemas/common.schemas';
import { MixLogListSchema, MixLogSchema, RepeatMixLogResultSchema, RepeatMixLogSchema, WriteMixLogSchema } from '../schemas/mix-log.schemas';
import { STAFF, endpoint } from './endpoint';

/** A booking's mix log, bowl by bowl. Desk, owner and stylists may call these; a stylist only on the bookings they work on. */
export const mixLogsApi = {
  list: endpoint({
    method: 'get',
    path: '/api/bookings/:id/mix-logs',
    access: STAFF,
    summary: "A booking's mix logs, with grams and estimated cost per product (developer apart) per sitting",
    params: IdParamsSchema,
    response: MixLogListSchema,
  }),
  write: endpoint({
    method: 'post',
    path: '/api/bookings/:id/mix-logs',
    access: STAFF,
    summary: 'Write one bowl of a sitting (before it starts too; not for a cancelled booking)',
    params: IdParamsSchema,
    body: WriteMixLogSchema,
    response: MixLogSchema,
    status: 201,
  }),
  repeat: endpoint({
    method: 'post',
    path: '/api/bookings/:id/mix-logs/repeat',
    access: STAFF,
    summary: "Copy an earlier sitting's bowls of the same client into a sitting of this booking",
    params: IdParamsSchema,
    body: RepeatMixLogSchema,
    response: RepeatMixLogResultSchema,
    status: 201,
  }),
};
