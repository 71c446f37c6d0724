/**
 * Re-planning a busy stylist's day through the planning port, as a tap or the desk's "Running late" asks it: a month
 * of the busy salon (tests/bench/busy-salon-db.ts) in a throwaway PostgreSQL cluster, the busiest stylist's day with
 * the first afternoon sitting's first step 30 minutes over and its second step running, then `replanDayFor` timed —
 * the salon's setup, the two days of the book and the day's actual times read, the engine, the answer mapped back.
 * Part of `npm run bench` (tests/bench/engine-bench.ts); DATABASE_URL to use another database.
 */
import { sql } from 'kysely';
import { createDb, createPool } from '@server/db/database';
import { replanDayFor } from '@server/features/planning';
import { withBenchDatabase } from './bench-database';
import { loadBusySalon } from './busy-salon-db';

const WARM_UP = 10;
const RUNS = 60;

export interface PortReplanBench {
  p50: number;
  p95: number;
  described: string;
}

/** The busiest stylist-day of the book, its first afternoon sitting of two steps or more overrun, and "now". */
async function overrunBusiestDay(db: ReturnType<typeof createDb>, salonId: string): Promise<{ stylistId: string; now: Date; sittings: number }> {
  const day = await sql<{ stylist_id: string; date: string; n: number }>`
    select b.stylist_id, (lower(si.during) at time zone s.time_zone)::date::text as date, count(*)::int as n
    from sittings si join bookings b on b.id = si.booking_id join salons s on s.id = b.salon_id
    where b.salon_id = ${salonId} and si.live and b.status = 'booked'
    group by 1, 2 order by n desc, 1, 2 limit 1`.execute(db);
  const busiest = day.rows[0]!;
  const steps = await sql<{ sitting_id: string; id: string; seq: number; start: Date; end: Date }>`
    select st.sitting_id, st.id, st.seq, lower(st.during) as start, upper(st.during) as end
    from booking_steps st join sittings si on si.id = st.sitting_id join bookings b on b.id = si.booking_id join salons s on s.id = b.salon_id
    where b.stylist_id = ${busiest.stylist_id} and si.live and (lower(si.during) at time zone s.time_zone)::date = ${busiest.date}::date
      and (lower(si.during) at time zone s.time_zone)::time >= '12:00'
      and (select count(*) from booking_steps x where x.sitting_id = si.id) >= 2
    order by lower(si.during), st.sitting_id, st.seq`.execute(db);
  const sittingId = steps.rows[0]!.sitting_id;
  const [first, second] = steps.rows.filter((s) => s.sitting_id === sittingId);
  const over = new Date(first!.end.getTime() + 30 * 60_000);
  const secondMinutes = (second!.end.getTime() - second!.start.getTime()) / 60_000;
  await db.updateTable('booking_steps').set({ actual_start: first!.start, actual_end: over }).where('id', '=', first!.id).execute();
  await db.updateTable('booking_steps').set({ actual_start: over }).where('id', '=', second!.id).execute();
  await db.updateTable('sittings').set({ status: 'in_progress', arrived_at: first!.start, late_minutes: 0 }).where('id', '=', sittingId).execute();
  return { stylistId: busiest.stylist_id, now: new Date(over.getTime() + Math.min(10, secondMinutes) * 60_000), sittings: busiest.n };
}

export function benchReplanViaPort(): Promise<PortReplanBench> {
  return withBenchDatabase(async (url) => {
    const db = createDb(createPool(url));
    try {
      // Every booking is still to come on 2027-03-01, so none is finished or a no-show: the day runs as booked until the overrun.
      const busy = await loadBusySalon(db, { from: '2027-03-01', months: 1, now: new Date('2027-03-01T00:00:00Z') });
      await sql`analyze`.execute(db);
      const { stylistId, now, sittings } = await overrunBusiestDay(db, busy.salonId);
      const row = await db.selectFrom('salons').selectAll().where('id', '=', busy.salonId).executeTakeFirstOrThrow();
      const salon = { id: row.id, timeZone: row.time_zone, granularityMinutes: row.granularity_minutes, lateStartLimitMinutes: row.late_start_limit_minutes };
      const run = () => replanDayFor(db, salon, stylistId, now);
      const answer = (await run())!;
      for (let i = 0; i < WARM_UP; i++) await run();
      const samples: number[] = [];
      for (let i = 0; i < RUNS; i++) {
        const t = performance.now();
        await run();
        samples.push(performance.now() - t);
      }
      samples.sort((a, b) => a - b);
      const at = (q: number) => samples[Math.min(samples.length - 1, Math.ceil(q * samples.length) - 1)]!;
      const fixes = answer.conflicts.reduce((n, c) => n + c.fixes.length, 0);
      return {
        p50: at(0.5),
        p95: at(0.95),
        described: `${busy.counts.bookings} bookings in the database; the busiest day has ${sittings} sittings, re-planned with ${answer.conflicts.length} conflicts, ${fixes} fixes`,
      };
    } finally {
      await db.destroy();
    }
  });
}
