import { sql } from 'kysely';
import type { Db } from '../../db/database';
import type { BookingStatus } from '../../../shared/schemas/common.schemas';
import type { StepPlan } from '../../../shared/schemas/step-plan.schemas';

/** One sitting of a booking that has a sitting starting in the period (cancelled ones included, holds not). */
export interface PeriodSitting {
  bookingId: string;
  status: BookingStatus;
  serviceId: string;
  serviceName: string;
  category: string;
  stylistId: string;
  priceCents: number;
  depositCents: number;
  depositOutcome: 'kept' | 'refunded' | null;
  /** Only for colour bookings (the only ones that can be corrections); null otherwise. */
  stepPlan: StepPlan | null;
  seq: number;
  /** Milliseconds since 1970 (plain numbers: thousands of rows are compared and summed). */
  start: number;
  end: number;
}

/**
 * Every sitting of the bookings with any sitting starting in [from, to): one query. The sittings of a
 * booking come together, in order, so callers can tell a booking's first sitting and its whole length.
 */
export async function listPeriodSittings(db: Db, salonId: string, from: Date, to: Date): Promise<PeriodSitting[]> {
  // One JSON value built by PostgreSQL: one JSON.parse instead of thousands of rows of parsed columns.
  const { rows } = await sql<{ sittings: PeriodSitting[] }>`
    select coalesce(json_agg(json_build_object(
      'bookingId', b.id, 'status', b.status, 'serviceId', b.service_id, 'serviceName', sv.name, 'category', sv.category,
      'stylistId', b.stylist_id, 'priceCents', b.price_cents, 'depositCents', b.deposit_cents, 'depositOutcome', b.deposit_outcome,
      'stepPlan', case when sv.category = 'colour' then b.step_plan end, 'seq', si.seq,
      'start', extract(epoch from lower(si.during)) * 1000, 'end', extract(epoch from upper(si.during)) * 1000
    ) order by b.id, si.seq), '[]'::json) as sittings
    from sittings si
    join bookings b on b.id = si.booking_id
    join services sv on sv.id = b.service_id
    where b.salon_id = ${salonId} and b.status <> 'held' and si.booking_id in (
      select f.booking_id from sittings f join bookings fb on fb.id = f.booking_id
      where fb.salon_id = ${salonId} and f.during && tstzrange(${from}, ${to}, '[)') and lower(f.during) >= ${from}
    )`.execute(db);
  return rows[0].sittings;
}

/** When each of these cancelled bookings was cancelled, from the audit log (the first cancel entry). */
export async function cancelledAt(db: Db, salonId: string, bookingIds: string[]): Promise<Map<string, Date>> {
  if (bookingIds.length === 0) return new Map();
  const rows = await db
    .selectFrom('audit_log')
    .select(['entity_id', sql<Date>`min(at)`.as('at')])
    .where('salon_id', '=', salonId)
    .where('entity', '=', 'booking')
    .where('entity_id', 'in', bookingIds)
    .where('action', 'like', 'cancelled%')
    .groupBy('entity_id')
    .execute();
  return new Map(rows.map((r) => [r.entity_id, r.at]));
}

export async function salonStaffNames(db: Db, salonId: string): Promise<Map<string, string>> {
  const rows = await db.selectFrom('staff').select(['id', 'display_name']).where('salon_id', '=', salonId).execute();
  return new Map(rows.map((r) => [r.id, r.display_name]));
}
