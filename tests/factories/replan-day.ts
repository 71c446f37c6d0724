import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import { insertBooking } from '@server/features/bookings/bookings.repository';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';

/*
 * A day under way, written straight into the book: sittings placed in minutes from the current 5-minute mark (the
 * salon's grid), and actual step times seeded in the past, as if the taps had been made. The salon is open around
 * the clock, so whatever hour the tests run the hours and closing rules stay out of the way.
 */

const GRID_MS = 5 * 60_000;

/** The current 5-minute mark: minute 0 of every step given here. */
export const gridBase = (now = Date.now()) => Math.floor(now / GRID_MS) * GRID_MS;
export const atMinute = (minute: number, base = gridBase()) => new Date(base + minute * 60_000);

/** Opens the salon (and later its stylists) every day, all day. */
export async function openAroundTheClock(db: Db, salonId: string): Promise<void> {
  await db.deleteFrom('salon_hours').where('salon_id', '=', salonId).execute();
  await db
    .insertInto('salon_hours')
    .values({ salon_id: salonId, rrule: 'FREQ=WEEKLY;BYDAY=MO,TU,WE,TH,FR,SA,SU', start_time: '00:00', end_time: '24:00' })
    .execute();
}

export const ALL_DAY = { rrule: 'FREQ=WEEKLY;BYDAY=MO,TU,WE,TH,FR,SA,SU', start: '00:00', end: '24:00' };

export type StepAt = { kind: 'hands_on' | 'developing' | 'basin'; label: string; from: number; to: number; basinId?: string };

/** A one-sitting booking with its steps at these minutes from the grid base, booked, in the given chair. */
export async function bookStepsAt(
  db: Db,
  input: { salonId: string; serviceId: string; stylistId: string; clientId: string | null; chairId: string; plan: StepPlan; steps: StepAt[]; base?: number },
): Promise<string> {
  return insertBooking(db, {
    salonId: input.salonId,
    clientId: input.clientId,
    serviceId: input.serviceId,
    stylistId: input.stylistId,
    status: 'booked',
    stepPlan: input.plan,
    priceCents: 10000,
    depositCents: 0,
    createdBy: null,
    sittings: [
      {
        chairId: input.chairId,
        steps: input.steps.map((s) => ({
          kind: s.kind,
          label: s.label,
          start: atMinute(s.from, input.base),
          end: atMinute(s.to, input.base),
          basinId: s.basinId ?? null,
        })),
      },
    ],
  });
}

/**
 * Actual times for the booking's first sitting, as taps would have left them: `[start, end]` minutes from the grid
 * base per step in order (end null while it runs); the client arrived at the first start and the sitting is under way.
 */
export async function seedActuals(db: Db, bookingId: string, actuals: Array<[number, number | null]>, base = gridBase()): Promise<void> {
  const sitting = await db.selectFrom('sittings').select('id').where('booking_id', '=', bookingId).where('seq', '=', 1).executeTakeFirstOrThrow();
  for (const [i, [start, end]] of actuals.entries()) {
    await db
      .updateTable('booking_steps')
      .set({ actual_start: atMinute(start, base), actual_end: end === null ? null : atMinute(end, base) })
      .where('sitting_id', '=', sitting.id)
      .where('seq', '=', i + 1)
      .execute();
  }
  const first = actuals[0];
  await db
    .updateTable('sittings')
    .set({ status: 'in_progress', arrived_at: first ? atMinute(first[0], base) : sql<Date>`now()`, late_minutes: 0 })
    .where('id', '=', sitting.id)
    .execute();
  await db.updateTable('bookings').set({ status: 'checked_in' }).where('id', '=', bookingId).execute();
}
