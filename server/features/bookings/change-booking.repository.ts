import { sql } from 'kysely';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import type { Db } from '@server/db/database';
import type { NewStep } from './bookings.repository';
import { tstzRange } from './bookings.repository';

/** Puts one sitting in a new chair at new times (its steps replaced). */
export async function replaceSitting(db: Db, bookingId: string, seq: number, chairId: string, stylistId: string, steps: NewStep[]): Promise<void> {
  const sitting = await db
    .updateTable('sittings')
    .set({ chair_id: chairId, during: tstzRange(steps[0]!.start, steps[steps.length - 1]!.end) }) // the engine places no empty sitting
    .where('booking_id', '=', bookingId)
    .where('seq', '=', seq)
    .returning('id')
    .executeTakeFirstOrThrow();
  await db.deleteFrom('booking_steps').where('sitting_id', '=', sitting.id).execute();
  await db
    .insertInto('booking_steps')
    .values(
      steps.map((s, j) => ({
        sitting_id: sitting.id,
        seq: j + 1,
        kind: s.kind,
        label: s.label,
        stylist_id: stylistId,
        basin_id: s.basinId,
        during: tstzRange(s.start, s.end),
      })),
    )
    .execute();
}

/** The booking's own step plan (its sittings and steps are replaced beside it). */
export async function setStepPlan(db: Db, bookingId: string, plan: StepPlan): Promise<void> {
  await db
    .updateTable('bookings')
    .set({ step_plan: JSON.stringify(plan) })
    .where('id', '=', bookingId)
    .execute();
}

export async function setStylist(db: Db, bookingId: string, stylistId: string): Promise<void> {
  await db.updateTable('bookings').set({ stylist_id: stylistId }).where('id', '=', bookingId).execute();
}

/** Cancels: the status and reason change, and every sitting and step stops holding its chair, basin and hands. */
export async function markCancelled(db: Db, bookingId: string, reason: string, depositOutcome: 'kept' | 'refunded' | null): Promise<void> {
  await db.updateTable('bookings').set({ status: 'cancelled', cancel_reason: reason, deposit_outcome: depositOutcome }).where('id', '=', bookingId).execute();
  await db.updateTable('sittings').set({ live: false }).where('booking_id', '=', bookingId).execute();
  await db
    .updateTable('booking_steps')
    .set({ live: false })
    .where('sitting_id', 'in', db.selectFrom('sittings').select('id').where('booking_id', '=', bookingId))
    .execute();
}

/** Held → booked, only while the hold is still within its time (one statement: no race with the lapse job). */
export async function confirmHeld(db: Db, id: string, now: Date): Promise<boolean> {
  const res = await db
    .updateTable('bookings')
    .set({ status: 'booked', held_until: null, hold_secret_hash: null })
    .where('id', '=', id)
    .where('status', '=', 'held')
    .where('held_until', '>', now)
    .executeTakeFirst();
  return Number(res.numUpdatedRows) === 1;
}

/**
 * A desk booking with a deposit is released if the deposit is still unpaid `hours` after it was made; no time is
 * set when that would come after the first sitting has started (the desk takes the deposit on the day).
 */
export async function setDepositDueBy(db: Db, bookingId: string, hours: number, now: Date): Promise<void> {
  const dueBy = new Date(now.getTime() + hours * 3_600_000);
  await db
    .updateTable('bookings')
    .set({ deposit_due_by: dueBy })
    .where('id', '=', bookingId)
    .where('deposit_cents', '>', 0)
    .where((eb) =>
      eb(
        eb
          .selectFrom('sittings')
          .select(sql<Date>`min(lower(during))`.as('start'))
          .where('booking_id', '=', bookingId),
        '>',
        dueBy,
      ),
    )
    .execute();
}

/** Start of each sitting of a booking, in order. */
export async function sittingStarts(db: Db, bookingId: string): Promise<Date[]> {
  const rows = await db
    .selectFrom('sittings')
    .select(sql<Date>`lower(during)`.as('start'))
    .where('booking_id', '=', bookingId)
    .orderBy('seq')
    .execute();
  return rows.map((r) => r.start);
}

/** The chair one sitting of a booking is in now. */
export async function sittingChair(db: Db, bookingId: string, seq: number): Promise<string | undefined> {
  const row = await db.selectFrom('sittings').select('chair_id').where('booking_id', '=', bookingId).where('seq', '=', seq).executeTakeFirst();
  return row?.chair_id;
}

/** Where one sitting of a booking stands on its day (booked until the desk and the stylist run it). */
export async function sittingStatus(db: Db, bookingId: string, seq: number): Promise<string | undefined> {
  const row = await db.selectFrom('sittings').select('status').where('booking_id', '=', bookingId).where('seq', '=', seq).executeTakeFirst();
  return row?.status;
}
