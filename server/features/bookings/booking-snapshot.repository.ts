import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { BookingStatus } from '@shared/schemas/common.schemas';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';

/** A booking as its changes read it, and as the audit log records it. */
export interface BookingSnapshot {
  booking: {
    status: BookingStatus;
    salonId: string;
    clientId: string | null;
    serviceId: string;
    stylistId: string;
    stepPlan: StepPlan;
    depositCents: number;
    depositOutcome: 'kept' | 'refunded' | null;
  };
  /** The service's own box "needs a skin test" (the steps' product families decide beside it). */
  serviceAsks: boolean;
  /** Status, stylist and where and when each sitting is: what an audit entry keeps before and after. */
  audit: { status: BookingStatus; stylist: string; sittings: { sitting: number; chair: string; start: string; end: string }[]; deposit?: 'kept' | 'refunded' };
}

/** A booking as the audit log records it: status, stylist and where and when each sitting is. */
export async function bookingSnapshot(db: Db, bookingId: string): Promise<BookingSnapshot | undefined> {
  const booking = await db
    .selectFrom('bookings as b')
    .innerJoin('staff as s', 's.id', 'b.stylist_id')
    .innerJoin('services as sv', 'sv.id', 'b.service_id')
    .select([
      'b.status',
      'b.salon_id',
      'b.client_id',
      'b.service_id',
      'b.stylist_id',
      'b.step_plan',
      'b.deposit_cents',
      'b.deposit_outcome',
      's.display_name as stylist',
      'sv.needs_skin_test',
    ])
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
    booking: {
      status: booking.status,
      salonId: booking.salon_id,
      clientId: booking.client_id,
      serviceId: booking.service_id,
      stylistId: booking.stylist_id,
      stepPlan: booking.step_plan as StepPlan,
      depositCents: booking.deposit_cents,
      depositOutcome: booking.deposit_outcome,
    },
    serviceAsks: booking.needs_skin_test,
    audit: {
      status: booking.status,
      stylist: booking.stylist,
      sittings: sittings.map((s) => ({ sitting: s.seq, chair: s.chair, start: s.start.toISOString(), end: s.end.toISOString() })),
      ...(booking.deposit_outcome ? { deposit: booking.deposit_outcome } : {}),
    },
  };
}
