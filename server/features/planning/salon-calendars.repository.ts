import { sql } from 'kysely';
import { DateTime } from 'luxon';
import type { Db } from '../../db/database';
import type { Scenario } from '../../../shared/engine/engine';
import { listSalonHours } from '../salon/salon.repository';
import { formatIso, parseLocalDate, zoneClock } from '../../../shared/engine/local-time';
import { localDateTimeOf } from '../../../shared/time/salon-time';

export interface Horizon {
  /** Local dates in the salon's zone; `to` is exclusive. */
  from: string;
  to: string;
}

/** A scenario without a request; window fits are added by the caller that needs them. */
export type SalonCalendars = Scenario;

/** A wall-clock `YYYY-MM-DDTHH:mm` in the salon's zone, the engine's input format. */
const hhmm = (t: string) => t.slice(0, 5);

/**
 * Everything the engine needs to know about a salon over a horizon: opening hours, stylists with their
 * hours and time off, chairs, basins, and every live booking step. `except` leaves one booking out
 * (a booking being moved must not collide with itself). `holds: false` leaves unpaid online holds out, for
 * figures: a hold keeps a time for a few minutes while someone pays, it is not work (planning keeps them in).
 */
export async function loadSalonCalendars(db: Db, salonId: string, horizon: Horizon, except?: string, { holds = true }: { holds?: boolean } = {}): Promise<SalonCalendars> {
  const salon = await db.selectFrom('salons').select(['time_zone', 'granularity_minutes']).where('id', '=', salonId).executeTakeFirstOrThrow();
  const zone = salon.time_zone;
  const from = DateTime.fromISO(horizon.from, { zone }).toJSDate();
  const to = DateTime.fromISO(horizon.to, { zone }).toJSDate();
  const range = sql`tstzrange(${from}, ${to}, '[)')`;
  const [hours, staff, staffHours, timeOff, chairs, basins, steps, closures] = await Promise.all([
    listSalonHours(db, salonId),
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
    db
      .selectFrom('booking_steps as st')
      .innerJoin('sittings as si', 'si.id', 'st.sitting_id')
      .innerJoin('bookings as b', 'b.id', 'si.booking_id')
      // UTC minutes (cut to the minute, as the wall-clock text is) as plain integers: cheap to send and parse.
      .select(['si.id as sittingId', 'b.stylist_id', 'si.chair_id', 'st.kind', 'st.basin_id', sql<number>`floor(extract(epoch from lower(st.during)) / 60)::int`.as('start'), sql<number>`floor(extract(epoch from upper(st.during)) / 60)::int`.as('end')])
      .where('b.salon_id', '=', salonId)
      .where('st.live', '=', true)
      .where('b.id', '!=', except ?? '00000000-0000-0000-0000-000000000000')
      .$if(!holds, (q) => q.where('b.status', '!=', 'held'))
      .where(sql<boolean>`si.during && ${range}`)
      .orderBy('si.id')
      .orderBy('st.seq')
      .execute(),
    db
      .selectFrom('out_of_service')
      .select(['chair_id', 'basin_id', sql<Date>`greatest(lower(during), ${from}::timestamptz)`.as('start'), sql<Date>`least(upper(during), ${to}::timestamptz)`.as('end')])
      .where('salon_id', '=', salonId)
      .where(sql<boolean>`during && ${range}`)
      .execute(),
  ]);
  const outOfService = (id: string) =>
    closures.filter((c) => c.chair_id === id || c.basin_id === id).map((c) => ({ start: localDateTimeOf(c.start, zone), end: localDateTimeOf(c.end, zone) }));
  // The engine's own offset table for the zone turns minutes into wall-clock text; luxon per instant is slow.
  const clock = zoneClock(zone, parseLocalDate(horizon.from)!, parseLocalDate(horizon.to)!);
  const local = (utc: number) => formatIso(utc, clock.offsetAt(utc)).slice(0, 16);
  const bookings = new Map<string, SalonCalendars['bookings'][number]>();
  for (const s of steps) {
    const booking = bookings.get(s.sittingId) ?? { id: s.sittingId, stylist: s.stylist_id, chair: s.chair_id, steps: [] };
    const times = { start: local(s.start), end: local(s.end) };
    booking.steps.push(s.kind === 'basin' ? { kind: 'basin', ...times, basin: s.basin_id! } : { kind: s.kind, ...times });
    bookings.set(s.sittingId, booking);
  }
  return {
    timeZone: zone,
    granularityMinutes: salon.granularity_minutes,
    horizon,
    salonHours: hours,
    stylists: staff.map((s) => ({
      id: s.id,
      skills: s.skills,
      maxClientsAtOnce: s.max_clients_at_once,
      hours: staffHours.filter((h) => h.staff_id === s.id).map((h) => ({ rrule: h.rrule, start: hhmm(h.start_time), end: hhmm(h.end_time) })),
      timeOff: timeOff.filter((t) => t.staff_id === s.id).map((t) => ({ start: localDateTimeOf(t.start, zone), end: localDateTimeOf(t.end, zone) })),
    })),
    chairs: chairs.map((c) => ({ id: c.id, outOfService: outOfService(c.id) })),
    basins: basins.map((b) => ({ id: b.id, outOfService: outOfService(b.id) })),
    bookings: [...bookings.values()],
    fits: [],
  };
}
