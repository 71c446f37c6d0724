import { sql } from 'kysely';
import type { Db } from '../../db/database';
import type { WriteMixLog } from '../../../shared/schemas/mix-log.schemas';

const COLUMNS = [
  'id', 'sitting_seq', 'bowl_no', 'product_type', 'shade_notes', 'developer_percent', 'ratio', 'grams', 'applied_to',
  'planned_minutes', 'actual_minutes', 'heat', 'result_notes', 'created_at',
] as const;

/** The booking as the mix log needs it, only within the caller's salon (another salon's booking is "not found"). */
export function findBookingForMixLog(db: Db, salonId: string, bookingId: string) {
  return db
    .selectFrom('bookings as b')
    .innerJoin('staff as st', 'st.id', 'b.stylist_id')
    .innerJoin('salons as s', 's.id', 'b.salon_id')
    .select(['b.id', 'b.client_id', 'b.status', 'st.user_id as stylist_user_id', 's.max_developer_percent'])
    .where('b.salon_id', '=', salonId)
    .where('b.id', '=', bookingId)
    .executeTakeFirst();
}

export function listSittingStarts(db: Db, bookingId: string) {
  return db
    .selectFrom('sittings')
    .select(['seq', sql<Date>`lower(during)`.as('start')])
    .where('booking_id', '=', bookingId)
    .orderBy('seq')
    .execute();
}

export function listMixLogs(db: Db, bookingId: string, sittingSeq?: number) {
  let q = db.selectFrom('mix_logs').select(COLUMNS).where('booking_id', '=', bookingId);
  if (sittingSeq !== undefined) q = q.where('sitting_seq', '=', sittingSeq);
  return q.orderBy('sitting_seq').orderBy('bowl_no').execute();
}
export type MixLogRow = Awaited<ReturnType<typeof listMixLogs>>[number];

export async function nextBowlNo(db: Db, bookingId: string, sittingSeq: number): Promise<number> {
  const row = await db
    .selectFrom('mix_logs')
    .select(sql<number>`coalesce(max(bowl_no), 0)::int`.as('last'))
    .where('booking_id', '=', bookingId)
    .where('sitting_seq', '=', sittingSeq)
    .executeTakeFirstOrThrow();
  return row.last + 1;
}

export function insertMixLogs(db: Db, rows: (WriteMixLog & { salonId: string; bookingId: string; createdBy: string })[]) {
  return db
    .insertInto('mix_logs')
    .values(
      rows.map((r) => ({
        salon_id: r.salonId, booking_id: r.bookingId, sitting_seq: r.sittingSeq, bowl_no: r.bowlNo, product_type: r.productType,
        shade_notes: r.shadeNotes, developer_percent: r.developerPercent, ratio: r.ratio, grams: JSON.stringify(r.grams),
        applied_to: r.appliedTo, planned_minutes: r.plannedMinutes, actual_minutes: r.actualMinutes, heat: r.heat,
        result_notes: r.resultNotes, created_by: r.createdBy,
      })),
    )
    .returning(COLUMNS)
    .execute();
}

/**
 * Sittings of this client's bookings that have bowls written, newest first: what "Repeat last time" can copy.
 * With `stylistUserId`, only that stylist's bookings (a stylist reads no one else's mix logs).
 */
export function listRepeatSources(db: Db, salonId: string, clientId: string, stylistUserId: string | null) {
  let q = db
    .selectFrom('mix_logs as m')
    .innerJoin('bookings as b', 'b.id', 'm.booking_id')
    .innerJoin('services as sv', 'sv.id', 'b.service_id')
    .innerJoin('staff as st', 'st.id', 'b.stylist_id')
    .innerJoin('sittings as si', (j) => j.onRef('si.booking_id', '=', 'm.booking_id').onRef('si.seq', '=', 'm.sitting_seq'))
    .select(['m.booking_id', 'm.sitting_seq', 'sv.name as service_name', sql<Date>`lower(si.during)`.as('start'), sql<number>`count(*)::int`.as('bowls')])
    .where('b.salon_id', '=', salonId)
    .where('b.client_id', '=', clientId);
  if (stylistUserId) q = q.where('st.user_id', '=', stylistUserId);
  return q.groupBy(['m.booking_id', 'm.sitting_seq', 'sv.name', 'si.during']).orderBy('start', 'desc').limit(40).execute();
}
