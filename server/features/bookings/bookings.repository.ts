import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { BookingStatus, StepKind } from '@shared/schemas/common.schemas';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';

export interface NewStep {
  kind: StepKind;
  label: string;
  start: Date;
  end: Date;
  basinId: string | null;
}

export interface NewBooking {
  salonId: string;
  clientId: string | null;
  serviceId: string;
  stylistId: string;
  status: BookingStatus;
  stepPlan: StepPlan;
  priceCents: number;
  depositCents: number;
  createdBy: string | null;
  cancelReason?: string;
  /** The consultation quote this booking carries out, if any. */
  quoteId?: string | null;
  sittings: { chairId: string; steps: NewStep[] }[];
}

/** `[start,end)` as a PostgreSQL tstzrange literal. */
export const tstzRange = (start: Date, end: Date) => `[${start.toISOString()},${end.toISOString()})`;

/**
 * Inserts a booking with its sittings and steps. Overlapping use of a chair, basin or stylist's hands
 * fails here with SQLSTATE 23P01 (the exclusion constraints); callers run it inside a transaction.
 */
export async function insertBooking(db: Db, booking: NewBooking): Promise<string> {
  const live = booking.status !== 'cancelled';
  const { id } = await db
    .insertInto('bookings')
    .values({
      salon_id: booking.salonId,
      client_id: booking.clientId,
      service_id: booking.serviceId,
      stylist_id: booking.stylistId,
      status: booking.status,
      step_plan: JSON.stringify(booking.stepPlan),
      price_cents: booking.priceCents,
      deposit_cents: booking.depositCents,
      held_until: null,
      cancel_reason: booking.cancelReason ?? null,
      deposit_outcome: null,
      created_by: booking.createdBy,
      quote_id: booking.quoteId ?? null,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  for (const [i, sitting] of booking.sittings.entries()) {
    // The engine places no empty sitting.
    const first = sitting.steps[0]!.start;
    const last = sitting.steps[sitting.steps.length - 1]!.end;
    const row = await db
      .insertInto('sittings')
      .values({ booking_id: id, seq: i + 1, chair_id: sitting.chairId, during: tstzRange(first, last), live })
      .returning('id')
      .executeTakeFirstOrThrow();
    await db
      .insertInto('booking_steps')
      .values(
        sitting.steps.map((s, j) => ({
          sitting_id: row.id,
          seq: j + 1,
          kind: s.kind,
          label: s.label,
          stylist_id: booking.stylistId,
          basin_id: s.basinId,
          during: tstzRange(s.start, s.end),
          live,
        })),
      )
      .execute();
  }
  return id;
}

/**
 * True when the chair belongs to the salon, is in service (active, not out of service then), and no live sitting
 * holds it in [start, end). `exceptBookingId`: a booking being moved does not stand in its own way.
 */
export async function chairFreeBetween(db: Db, salonId: string, chairId: string, start: Date, end: Date, exceptBookingId?: string): Promise<boolean> {
  const chair = await db
    .selectFrom('chairs')
    .select('id')
    .where('id', '=', chairId)
    .where('salon_id', '=', salonId)
    .where('active', '=', true)
    .executeTakeFirst();
  if (!chair) return false;
  const span = sql<boolean>`during && tstzrange(${start}, ${end}, '[)')`;
  const [taken, closed] = await Promise.all([
    db
      .selectFrom('sittings')
      .select('id')
      .where('chair_id', '=', chairId)
      .where('live', '=', true)
      .where('booking_id', '!=', exceptBookingId ?? '00000000-0000-0000-0000-000000000000')
      .where(span)
      .executeTakeFirst(),
    db.selectFrom('out_of_service').select('id').where('chair_id', '=', chairId).where(span).executeTakeFirst(),
  ]);
  return !taken && !closed;
}

/** A client's held and booked bookings with a sitting still to come: their service, step plan and each sitting's start. */
export async function upcomingBookingsOfClient(db: Db, clientId: string, now: Date) {
  const rows = await db
    .selectFrom('bookings as b')
    .innerJoin('services as s', 's.id', 'b.service_id')
    .select([
      'b.id',
      'b.status',
      's.name',
      's.needs_skin_test',
      'b.step_plan',
      sql<Date[]>`array(select lower(si.during) from sittings si where si.booking_id = b.id order by si.seq)`.as('starts'),
    ])
    .where('b.client_id', '=', clientId)
    .where('b.status', 'in', ['held', 'booked'])
    .where(sql<boolean>`exists (select 1 from sittings si where si.booking_id = b.id and lower(si.during) > ${now})`)
    .execute();
  return rows.map((b) => ({
    id: b.id,
    status: b.status,
    serviceName: b.name,
    needsSkinTest: b.needs_skin_test,
    stepPlan: b.step_plan as StepPlan,
    starts: b.starts,
  }));
}
