import { sql } from 'kysely';
import type { Db } from '@server/db/database';

/** One stylist's finished sittings of the period with tapped times, summed (minutes). */
export interface TimekeepingTally {
  stylistId: string;
  sittings: number;
  onTime: number;
  lateArrivals: number;
  plannedMinutes: number;
  actualMinutes: number;
  overrunMinutes: number;
}

/**
 * Per stylist (the booking's), the finished sittings planned to start in [from, to) whose first step has an actual
 * start and some step an actual end. On time: the first step started no later than `onTimeMinutes` after the
 * sitting's planned start (an early start is on time). Actual chair time runs from that start to the last actual
 * end; a sitting's overrun is how much longer that was than its planned length, never below 0.
 */
export async function timekeepingByStylist(db: Db, salonId: string, from: Date, to: Date, onTimeMinutes: number): Promise<TimekeepingTally[]> {
  const result = await sql<TimekeepingTally>`
    with timed as (
      select b.stylist_id, si.late_minutes,
        first.actual_start > lower(si.during) + make_interval(mins => ${onTimeMinutes}) as late_start,
        (extract(epoch from (upper(si.during) - lower(si.during))) / 60)::float8 as planned,
        (extract(epoch from (last.actual_end - first.actual_start)) / 60)::float8 as actual
      from sittings si
      join bookings b on b.id = si.booking_id
      cross join lateral (select actual_start from booking_steps where sitting_id = si.id order by seq limit 1) first
      cross join lateral (select max(actual_end) as actual_end from booking_steps where sitting_id = si.id) last
      where b.salon_id = ${salonId} and si.status = 'finished'
        and lower(si.during) >= ${from} and lower(si.during) < ${to}
        and first.actual_start is not null and last.actual_end is not null
    )
    select stylist_id as "stylistId",
      count(*)::int as sittings,
      (count(*) filter (where not late_start))::int as "onTime",
      (count(*) filter (where late_start and coalesce(late_minutes, 0) > ${onTimeMinutes}))::int as "lateArrivals",
      sum(planned)::float8 as "plannedMinutes",
      sum(actual)::float8 as "actualMinutes",
      sum(greatest(0, actual - planned))::float8 as "overrunMinutes"
    from timed
    group by stylist_id
  `.execute(db);
  return result.rows;
}
