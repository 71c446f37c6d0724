import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { BookingStatus } from '@shared/schemas/common.schemas';
import type { MixLog, RepeatSource, WriteMixLog } from '@shared/schemas/mix-log.schemas';

const COLUMNS = [
  'id',
  'sitting_seq',
  'bowl_no',
  'product_type',
  'shade_notes',
  'developer_percent',
  'ratio',
  'grams',
  'applied_to',
  'planned_minutes',
  'actual_minutes',
  'heat',
  'result_notes',
  'created_at',
] as const;

/** One written bowl as stored; the view adds the developer's strength in volumes. */
export type StoredBowl = Omit<MixLog, 'developerVolume'>;
type BowlRow = Awaited<ReturnType<ReturnType<typeof bowlsOf>['execute']>>[number];
const bowlsOf = (db: Db, bookingId: string) => db.selectFrom('mix_logs').select(COLUMNS).where('booking_id', '=', bookingId);

const toBowl = (r: BowlRow): StoredBowl => ({
  id: r.id,
  sittingSeq: r.sitting_seq,
  bowlNo: r.bowl_no,
  productType: r.product_type,
  shadeNotes: r.shade_notes,
  developerPercent: r.developer_percent === null ? null : Number(r.developer_percent),
  ratio: r.ratio,
  grams: r.grams,
  appliedTo: r.applied_to,
  plannedMinutes: r.planned_minutes,
  actualMinutes: r.actual_minutes,
  heat: r.heat,
  resultNotes: r.result_notes,
  createdAt: r.created_at.toISOString(),
});

export interface MixLogBooking {
  id: string;
  clientId: string | null;
  status: BookingStatus;
  stylistUserId: string | null;
  /** The salon's maximum developer strength, in percent. */
  maxDeveloperPercent: number;
}

/** The booking as the mix log needs it, only within the caller's salon (another salon's booking is "not found"). */
export async function findBookingForMixLog(db: Db, salonId: string, bookingId: string): Promise<MixLogBooking | undefined> {
  const row = await db
    .selectFrom('bookings as b')
    .innerJoin('staff as st', 'st.id', 'b.stylist_id')
    .innerJoin('salons as s', 's.id', 'b.salon_id')
    .select(['b.id', 'b.client_id', 'b.status', 'st.user_id as stylist_user_id', 's.max_developer_percent'])
    .where('b.salon_id', '=', salonId)
    .where('b.id', '=', bookingId)
    .executeTakeFirst();
  return (
    row && {
      id: row.id,
      clientId: row.client_id,
      status: row.status,
      stylistUserId: row.stylist_user_id,
      maxDeveloperPercent: Number(row.max_developer_percent),
    }
  );
}

/** The salon's maximum developer strength, in percent (strand tests are held to it too). */
export async function maxDeveloperPercent(db: Db, salonId: string): Promise<number> {
  const salon = await db.selectFrom('salons').select('max_developer_percent').where('id', '=', salonId).executeTakeFirstOrThrow();
  return Number(salon.max_developer_percent);
}

export function listSittingStarts(db: Db, bookingId: string) {
  return db
    .selectFrom('sittings')
    .select(['seq', sql<Date>`lower(during)`.as('start')])
    .where('booking_id', '=', bookingId)
    .orderBy('seq')
    .execute();
}

export async function listMixLogs(db: Db, bookingId: string, sittingSeq?: number): Promise<StoredBowl[]> {
  let q = bowlsOf(db, bookingId);
  if (sittingSeq !== undefined) q = q.where('sitting_seq', '=', sittingSeq);
  return (await q.orderBy('sitting_seq').orderBy('bowl_no').execute()).map(toBowl);
}

export async function nextBowlNo(db: Db, bookingId: string, sittingSeq: number): Promise<number> {
  const row = await db
    .selectFrom('mix_logs')
    .select(sql<number>`coalesce(max(bowl_no), 0)::int`.as('last'))
    .where('booking_id', '=', bookingId)
    .where('sitting_seq', '=', sittingSeq)
    .executeTakeFirstOrThrow();
  return row.last + 1;
}

export async function insertMixLogs(db: Db, rows: (WriteMixLog & { salonId: string; bookingId: string; createdBy: string })[]): Promise<StoredBowl[]> {
  const written = await db
    .insertInto('mix_logs')
    .values(
      rows.map((r) => ({
        salon_id: r.salonId,
        booking_id: r.bookingId,
        sitting_seq: r.sittingSeq,
        bowl_no: r.bowlNo,
        product_type: r.productType,
        shade_notes: r.shadeNotes,
        developer_percent: r.developerPercent,
        ratio: r.ratio,
        grams: JSON.stringify(r.grams),
        applied_to: r.appliedTo,
        planned_minutes: r.plannedMinutes,
        actual_minutes: r.actualMinutes,
        heat: r.heat,
        result_notes: r.resultNotes,
        created_by: r.createdBy,
      })),
    )
    .returning(COLUMNS)
    .execute();
  return written.map(toBowl);
}

/**
 * Sittings of this client's bookings that have bowls written, newest first: what "Repeat last time" can copy.
 * With `stylistUserId`, only that stylist's bookings (a stylist reads no one else's mix logs).
 */
export async function listRepeatSources(db: Db, salonId: string, clientId: string, stylistUserId: string | null): Promise<RepeatSource[]> {
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
  const rows = await q.groupBy(['m.booking_id', 'm.sitting_seq', 'sv.name', 'si.during']).orderBy('start', 'desc').limit(40).execute();
  return rows.map((r) => ({ bookingId: r.booking_id, sittingSeq: r.sitting_seq, serviceName: r.service_name, start: r.start.toISOString(), bowls: r.bowls }));
}
