import { sql } from 'kysely';
import type { Db } from '../db/database';

/*
 * Past days of the demo book as they really went: each finished sitting has an arrival (now and then a few minutes
 * late) and every step an actual start and end, one after the other, some developing steps running over and some
 * finishing early, so the booking pages and plan-vs-actual figures show something real. A past no-show stops holding
 * its time, as one marked on the day does. Today's and later sittings are left booked for the desk to run.
 */

// Deterministic patterns (minutes), picked by the booking's number and the step's, so every load reads the same.
const LATE = [0, 0, 4, 0, 9, 0, 2, 0, 14];
const HANDS_DELTA = [0, 3, -2, 0, 6, -4, 0, 2];
const DEVELOPING_DELTA = [0, 12, -5, 0, 8, -6, 20, 0, -3];

/** Actual times for the sittings of booking `bookingId` that ended before `todayStart`; `n` varies the pattern. */
export async function recordPastActuals(db: Db, bookingId: string, n: number, todayStart: Date, noShow: boolean): Promise<void> {
  const sittings = await db
    .selectFrom('sittings')
    .select(['id', 'seq', sql<Date>`lower(during)`.as('start'), sql<Date>`upper(during)`.as('end')])
    .where('booking_id', '=', bookingId)
    .where(sql<boolean>`upper(during) <= ${todayStart}`)
    .orderBy('seq')
    .execute();
  for (const sitting of sittings) {
    if (noShow) {
      await db.updateTable('sittings').set({ status: 'no_show', live: false }).where('id', '=', sitting.id).execute();
      await db.updateTable('booking_steps').set({ live: false }).where('sitting_id', '=', sitting.id).execute();
      continue;
    }
    const late = LATE[(n + sitting.seq) % LATE.length] ?? 0;
    const arrived = new Date(sitting.start.getTime() + late * 60_000);
    await db.updateTable('sittings').set({ status: 'finished', arrived_at: arrived, late_minutes: late }).where('id', '=', sitting.id).execute();
    const steps = await db
      .selectFrom('booking_steps')
      .select(['id', 'seq', 'kind', sql<Date>`lower(during)`.as('start'), sql<Date>`upper(during)`.as('end')])
      .where('sitting_id', '=', sitting.id)
      .orderBy('seq')
      .execute();
    let at = new Date(Math.max(arrived.getTime() + 2 * 60_000, sitting.start.getTime()));
    for (const step of steps) {
      const planned = (step.end.getTime() - step.start.getTime()) / 60_000;
      const deltas = step.kind === 'developing' ? DEVELOPING_DELTA : HANDS_DELTA;
      const minutes = Math.max(5, planned + (deltas[(n * 3 + step.seq) % deltas.length] ?? 0));
      const end = new Date(at.getTime() + minutes * 60_000);
      await db.updateTable('booking_steps').set({ actual_start: at, actual_end: end }).where('id', '=', step.id).execute();
      at = new Date(end.getTime() + ((n + step.seq) % 3) * 60_000);
    }
  }
}
