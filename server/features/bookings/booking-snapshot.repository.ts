import { sql } from 'kysely';
import type { Db } from '../../db/database';

/** A booking as the audit log records it: status, stylist and where and when each sitting is. */
export async function bookingSnapshot(db: Db, bookingId: string) {
  const booking = await db
    .selectFrom('bookings as b')
    .innerJoin('staff as s', 's.id', 'b.stylist_id')
    .innerJoin('services as sv', 'sv.id', 'b.service_id')
    .select(['b.status', 'b.salon_id', 'b.client_id', 'b.service_id', 'b.stylist_id', 'b.step_plan', 'b.deposit_cents', 'b.deposit_outcome', 's.display_name as stylist', 'sv.needs_skin_test'])
    .where('b.id', '=', bookingId)
    .executeTakeFirst();
  if (!booking) return undefined;
  const sittings = await db
    .selectFrom('sittings as si')
    .innerJoin('chairs as c', 'c.id', 'si.chair_id')
    .select(['si.seq', 'c.name as chair', sql<Date>`lower(si.during)`.as('start'), sql<Date>`upper(si.during)`.as('end')])
    .where('si.booking_id', '=', bookingId)
    .orderBy('si.seq')
    .execute();
  return {
    row: booking,
    serviceAsks: booking.needs_skin_test,
    audit: {
      status: booking.status,
      stylist: booking.stylist,
      sittings: sittings.map((s) => ({ sitting: s.seq, chair: s.chair, start: s.start.toISOString(), end: s.end.toISOString() })),
      ...(booking.deposit_outcome ? { deposit: booking.deposit_outcome } : {}),
    },
  };
}
