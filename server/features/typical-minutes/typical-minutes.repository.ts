import { sql } from 'kysely';
import type { Db } from '@server/db/database';

/** One step's actual minutes over its latest finished visits, for the salon (`stylistId` null) or one stylist. */
export interface TypicalRow {
  sitting: number;
  label: string;
  occurrence: number;
  stylistId: string | null;
  stylistName: string | null;
  visits: number;
  median: number;
  p80: number;
}

/** Whether the service is one of the salon's (on the menu or retired). */
export async function serviceInSalon(db: Db, salonId: string, serviceId: string): Promise<boolean> {
  const row = await db.selectFrom('services').select('id').where('id', '=', serviceId).where('salon_id', '=', salonId).executeTakeFirst();
  return row !== undefined;
}

/**
 * Each step's actual minutes (actual end − actual start) over the `lastVisits` latest finished sittings of the
 * service that timed it, for the whole salon and per stylist (only `stylistId` when given). A step is matched by its
 * sitting, its label and which time that label comes in the sitting, so a booking's edited plan still lines up.
 * The median and 80th percentile are PostgreSQL's `percentile_cont`: linear interpolation between the two
 * neighbouring values at position p × (n − 1), Hyndman and Fan's definition 7.
 */
export async function typicalStepMinutes(
  db: Db,
  input: { salonId: string; serviceId: string; lastVisits: number; stylistId: string | null },
): Promise<TypicalRow[]> {
  const { salonId, serviceId, lastVisits, stylistId } = input;
  const result = await sql<TypicalRow>`
    with steps as (
      select si.seq as sitting, bs.label, bs.stylist_id, bs.id, bs.actual_start,
        row_number() over (partition by bs.sitting_id, bs.label order by bs.seq)::int as occurrence,
        (extract(epoch from (bs.actual_end - bs.actual_start)) / 60)::float8 as minutes
      from booking_steps bs
      join sittings si on si.id = bs.sitting_id
      join bookings b on b.id = si.booking_id
      where b.salon_id = ${salonId} and b.service_id = ${serviceId} and si.status = 'finished'
    ),
    timed as (
      select *,
        row_number() over (partition by sitting, label, occurrence order by actual_start desc, id) as salon_rank,
        row_number() over (partition by sitting, label, occurrence, stylist_id order by actual_start desc, id) as stylist_rank
      from steps
      where minutes is not null
    ),
    figures as (
      select sitting, label, occurrence, null::uuid as stylist_id, count(*)::int as visits,
        percentile_cont(0.5) within group (order by minutes) as median,
        percentile_cont(0.8) within group (order by minutes) as p80
      from timed where salon_rank <= ${lastVisits}
      group by sitting, label, occurrence
      union all
      select sitting, label, occurrence, stylist_id, count(*)::int,
        percentile_cont(0.5) within group (order by minutes),
        percentile_cont(0.8) within group (order by minutes)
      from timed where stylist_rank <= ${lastVisits} and (${stylistId}::uuid is null or stylist_id = ${stylistId}::uuid)
      group by sitting, label, occurrence, stylist_id
    )
    select f.sitting, f.label, f.occurrence, f.stylist_id as "stylistId", st.display_name as "stylistName", f.visits, f.median, f.p80
    from figures f left join staff st on st.id = f.stylist_id
    order by f.sitting, f.label, f.occurrence, st.display_name nulls first
  `.execute(db);
  return result.rows;
}
