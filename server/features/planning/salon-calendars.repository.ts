import { sql, type RawBuilder } from 'kysely';
import { DateTime } from 'luxon';
import type { Db } from '../../db/database';
import type { Scenario } from '../../../shared/engine/engine';

export interface Horizon {
  /** Local dates in the salon's zone; `to` is exclusive. */
  from: string;
  to: string;
}

/** A scenario without a request; window fits are added by the caller that needs them. */
export type SalonCalendars = Scenario;

/** A wall-clock `YYYY-MM-DDTHH:mm` in the salon's zone, the engine's input format. */
export const toLocal = (d: Date, zone: string) => DateTime.fromJSDate(d, { zone }).toFormat("yyyy-MM-dd'T'HH:mm");
const hhmm = (t: string) => t.slice(0, 5);
/** The same `YYYY-MM-DDTHH:mm` as toLocal, computed by PostgreSQL for a timestamptz expression. */
const localText = (instant: RawBuilder<unknown>, zone: string) => sql<string>`to_char(${instant} at time zone ${zone}, 'YYYY-MM-DD"T"HH24:MI')`;

/**
 * Everything the engine needs to know about a salon over a horizon: opening hours, stylists with their
 * hours and time off, chairs, basins, and every live booking step. `except` leaves one booking out
 * (a booking being moved must not collide with itself).
 */
export async function loadSalonCalendars(db: Db, salonId: string, horizon: Horizon, except?: string): Promise<SalonCalendars> {
  const salon = await db.selectFrom('salons').select(['time_zone', 'granularity_minutes']).where('id', '=', salonId).executeTakeFirstOrThrow();
  const zone = salon.time_zone;
  const from = DateTime.fromISO(horizon.from, { zone }).toJSDate();
  const to = DateTime.fromISO(horizon.to, { zone }).toJSDate();
  const range = sql`tstzrange(${from}, ${to}, '[)')`;
  const [hours, staff, staffHours, timeOff, chairs, basins, steps, closures] = await Promise.all([
    db.selectFrom('salon_hours').select(['rrule', 'start_time', 'end_time']).where('salon_id', '=', salonId).execute(),
    db.selectFrom('staff').select(['id', 'skills', 'max_clients_at_once']).where('salon_id', '=', salonId).where('active', '=', true).orderBy('id').execute(),
    db.selectFrom('staff_hours as h').innerJoin('staff as s', 's.id', 'h.staff_id').select(['h.staff_id', 'h.rrule', 'h.start_time', 'h.end_time']).where('s.salon_id', '=', salonId).execute(),
    db
      .selectFrom('time_off as t')
      .innerJoin('staff as s', 's.id', 't.staff_id')
      .select(['t.staff_id', sql<Date>`greatest(lower(t.during), ${from}::timestamptz)`.as('start'), sql<Date>`least(upper(t.during), ${to}::timestamptz)`.as('end')])
      .where('s.salon_id', '=', salonId)
      .where(sql<boolean>`t.during && ${range}`)
      .execute(),
    db.selectFrom('chairs').select('id').where('salon_id', '=', salonId).where('active', '=', true).orderBy('name').execute(),
    db.selectFrom('basins').select('id').where('salon_id', '=', salonId).where('active', '=', true).orderBy('name').execute(),
    // Each live sitting as the engine's booking object, built by PostgreSQL as one JSON value: thousands of
    // steps then cost one JSON.parse instead of a row each (and a luxon conversion per instant).
    sql<{ bookings: SalonCalendars['bookings'] }>`
      select coalesce(json_agg(json_build_object('id', q.id, 'stylist', q.stylist, 'chair', q.chair, 'steps', q.steps) order by q.id), '[]'::json) as bookings
      from (
        select si.id, b.stylist_id as stylist, si.chair_id as chair,
          json_agg(json_strip_nulls(json_build_object('kind', st.kind, 'start', ${localText(sql`lower(st.during)`, zone)}, 'end', ${localText(sql`upper(st.during)`, zone)}, 'basin', st.basin_id)) order by st.seq) as steps
        from booking_steps st
        join sittings si on si.id = st.sitting_id
        join bookings b on b.id = si.booking_id
        where b.salon_id = ${salonId} and st.live and b.id <> ${except ?? '00000000-0000-0000-0000-000000000000'} and si.during && ${range}
        group by si.id, b.stylist_id, si.chair_id
      ) q`.execute(db),
    db
      .selectFrom('out_of_service')
      .select(['chair_id', 'basin_id', sql<Date>`greatest(lower(during), ${from}::timestamptz)`.as('start'), sql<Date>`least(upper(during), ${to}::timestamptz)`.as('end')])
      .where('salon_id', '=', salonId)
      .where(sql<boolean>`during && ${range}`)
      .execute(),
  ]);
  const outOfService = (id: string) =>
    closures.filter((c) => c.chair_id === id || c.basin_id === id).map((c) => ({ start: toLocal(c.start, zone), end: toLocal(c.end, zone) }));
  return {
    timeZone: zone,
    granularityMinutes: salon.granularity_minutes,
    horizon,
    salonHours: hours.map((h) => ({ rrule: h.rrule, start: hhmm(h.start_time), end: hhmm(h.end_time) })),
    stylists: staff.map((s) => ({
      id: s.id,
      skills: s.skills,
      maxClientsAtOnce: s.max_clients_at_once,
      hours: staffHours.filter((h) => h.staff_id === s.id).map((h) => ({ rrule: h.rrule, start: hhmm(h.start_time), end: hhmm(h.end_time) })),
      timeOff: timeOff.filter((t) => t.staff_id === s.id).map((t) => ({ start: toLocal(t.start, zone), end: toLocal(t.end, zone) })),
    })),
    chairs: chairs.map((c) => ({ id: c.id, outOfService: outOfService(c.id) })),
    basins: basins.map((b) => ({ id: b.id, outOfService: outOfService(b.id) })),
    bookings: steps.rows[0].bookings,
    fits: [],
  };
}
