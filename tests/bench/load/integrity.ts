import { sql } from 'kysely';
import type { Db } from '@server/db/database';

/**
 * Overlaps the exclusion constraints forbid, counted by a plain query (so a dropped constraint would show):
 * a chair, a stylist's hands (hands-on and basin steps) or a basin in two live places at once.
 */
export async function doubleBookings(db: Db): Promise<{ chairs: number; hands: number; basins: number }> {
  const { rows } = await sql<{ chairs: number; hands: number; basins: number }>`
    select
      (select count(*)::int from sittings a join sittings b on a.chair_id = b.chair_id and a.id < b.id
        where a.live and b.live and a.during && b.during) as chairs,
      (select count(*)::int from booking_steps a join booking_steps b on a.stylist_id = b.stylist_id and a.id < b.id
        where a.live and b.live and a.kind in ('hands_on', 'basin') and b.kind in ('hands_on', 'basin') and a.during && b.during) as hands,
      (select count(*)::int from booking_steps a join booking_steps b on a.basin_id = b.basin_id and a.id < b.id
        where a.live and b.live and a.during && b.during) as basins`.execute(db);
  return rows[0]!;
}

/** Bookings with no sitting, or sittings with no step: what a half-written booking would leave. */
export async function halfWritten(db: Db): Promise<number> {
  const { rows } = await sql<{ n: number }>`
    select (select count(*)::int from bookings b where not exists (select 1 from sittings s where s.booking_id = b.id))
         + (select count(*)::int from sittings s where not exists (select 1 from booking_steps st where st.sitting_id = s.id)) as n`.execute(db);
  return rows[0]!.n;
}

/** Messages planned twice for the same purpose (the send log's dedupe key). */
export async function duplicateMessages(db: Db): Promise<number> {
  const { rows } = await sql<{ n: number }>`
    select count(*)::int as n from (select dedupe_key from messages group by dedupe_key having count(*) > 1) d`.execute(db);
  return rows[0]!.n;
}
