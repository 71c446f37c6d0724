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

/** Seats one sitting in another chair at the same times (the chair constraint has the last word). */
export async function setSittingChair(db: Db, sittingId: string, chairId: string): Promise<void> {
  await db.updateTable('sittings').set({ chair_id: chairId }).where('id', '=', sittingId).execute();
}

/** Gives one basin step another basin at the same times (the basin constraint has the last word). */
export async function setStepBasin(db: Db, stepId: string, basinId: string): Promise<void> {
  await db.updateTable('booking_steps').set({ basin_id: basinId }).where('id', '=', stepId).execute();
}

/**
 * New times for a sitting's steps, kept by id (their actual times and taps stay), and the sitting's span with them.
 * The steps leave the constraints while they move and come back together, so a step moving onto where its
 * neighbour was a moment ago is not taken for an overlap; against every other booking the constraints still decide.
 */
export async function retimeSittingSteps(db: Db, sittingId: string, steps: Array<{ id: string; start: Date; end: Date }>): Promise<void> {
  if (steps.length === 0) return;
  const held = await db
    .updateTable('booking_steps')
    .set({ live: false })
    .where('sitting_id', '=', sittingId)
    .where('live', '=', true)
    .returning('id')
    .execute();
  for (const step of steps) {
    await db
      .updateTable('booking_steps')
      .set({ during: tstzRange(step.start, step.end) })
      .where('id', '=', step.id)
      .where('sitting_id', '=', sittingId)
      .execute();
  }
  if (held.length > 0)
    await db
      .updateTable('booking_steps')
      .set({ live: true })
      .where(
        'id',
        'in',
        held.map((h) => h.id),
      )
      .execute();
  const span = await db
    .selectFrom('booking_steps')
    .select([sql<Date>`min(lower(during))`.as('start'), sql<Date>`max(upper(during))`.as('end')])
    .where('sitting_id', '=', sittingId)
    .executeTakeFirstOrThrow();
  await db
    .updateTable('sittings')
    .set({ during: tstzRange(span.start, span.end) })
    .where('id', '=', sittingId)
    .execute();
}

/** A basin of the salon, in use and in service for the whole stretch, with no other live step on it. */
export async function basinFreeBetween(db: Db, salonId: string, basinId: string, start: Date, end: Date, exceptStepId: string): Promise<boolean> {
  const basin = await db
    .selectFrom('basins')
    .select('id')
    .where('id', '=', basinId)
    .where('salon_id', '=', salonId)
    .where('active', '=', true)
    .executeTakeFirst();
  if (!basin) return false;
  const span = sql<boolean>`during && tstzrange(${start}, ${end}, '[)')`;
  const [taken, closed] = await Promise.all([
    db
      .selectFrom('booking_steps')
      .select('id')
      .where('basin_id', '=', basinId)
      .where('live', '=', true)
      .where('id', '!=', exceptStepId)
      .where(span)
      .executeTakeFirst(),
    db.selectFrom('out_of_service').select('id').where('basin_id', '=', basinId).where(span).executeTakeFirst(),
  ]);
  return !taken && !closed;
}

/** One sitting by id, as a change to its chair or steps reads it. */
export async function findSittingById(db: Db, sittingId: string) {
  return db
    .selectFrom('sittings')
    .select(['id', 'booking_id as bookingId', 'seq', 'status', 'chair_id as chairId', sql<Date>`lower(during)`.as('start'), sql<Date>`upper(during)`.as('end')])
    .where('id', '=', sittingId)
    .where('live', '=', true)
    .executeTakeFirst();
}

/** The live steps of a sitting, in order, with their planned and actual times. */
export async function listSittingSteps(db: Db, sittingId: string) {
  return db
    .selectFrom('booking_steps')
    .select([
      'id',
      'seq',
      'kind',
      'label',
      'basin_id as basinId',
      'actual_start as actualStart',
      'actual_end as actualEnd',
      sql<Date>`lower(during)`.as('start'),
      sql<Date>`upper(during)`.as('end'),
    ])
    .where('sitting_id', '=', sittingId)
    .where('live', '=', true)
    .orderBy('seq')
    .execute();
}
