import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { BookingStatus } from '@shared/schemas/common.schemas';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import type { SittingStatus } from '@shared/schemas/day-of-service.schemas';

/** One sitting of a booking that has a sitting starting in the period (cancelled ones included, holds not). */
export interface PeriodSitting {
  bookingId: string;
  status: BookingStatus;
  serviceId: string;
  serviceName: string;
  category: string;
  stylistId: string;
  depositOutcome: 'kept' | 'refunded' | null;
  /** Only for colour bookings (the only ones that can be corrections); null otherwise. */
  stepPlan: StepPlan | null;
  seq: number;
  /** Where the sitting stood on its day: a no-show mark counts in the attendance figures. */
  sittingStatus: SittingStatus;
  /** Milliseconds since 1970 (plain numbers: thousands of rows are compared and summed). */
  start: number;
  end: number;
}

/**
 * Every sitting of the bookings with any sitting starting in [from, to): one query. The sittings of a
 * booking come together, in order, so callers can tell a booking's first sitting and its whole length.
 */
export async function listPeriodSittings(db: Db, salonId: string, from: Date, to: Date): Promise<PeriodSitting[]> {
  const rows = await db
    .selectFrom('sittings as si')
    .innerJoin('bookings as b', 'b.id', 'si.booking_id')
    .innerJoin('services as sv', 'sv.id', 'b.service_id')
    .select([
      'b.id as bookingId',
      'b.status',
      'b.service_id as serviceId',
      'sv.name as serviceName',
      'sv.category',
      'b.stylist_id as stylistId',
      'b.deposit_outcome as depositOutcome',
      'si.seq',
      'si.status as sittingStatus',
      // Plain numbers and a step plan only where it can matter: thousands of rows parse quickly.
      sql<StepPlan | null>`case when sv.category = 'colour' then b.step_plan end`.as('stepPlan'),
      sql<number>`extract(epoch from lower(si.during))::float8 * 1000`.as('start'),
      sql<number>`extract(epoch from upper(si.during))::float8 * 1000`.as('end'),
    ])
    .where('b.salon_id', '=', salonId)
    .where('b.status', '!=', 'held')
    .where(
      'si.booking_id',
      'in',
      db
        .selectFrom('sittings as f')
        .innerJoin('bookings as fb', 'fb.id', 'f.booking_id')
        .select('f.booking_id')
        .where('fb.salon_id', '=', salonId)
        .where(sql<boolean>`f.during && tstzrange(${from}, ${to}, '[)')`)
        .where(sql<boolean>`lower(f.during) >= ${from}`),
    )
    .orderBy('b.id')
    .orderBy('si.seq')
    .execute();
  return rows;
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
