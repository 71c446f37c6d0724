import { sql } from 'kysely';
import { jsonArrayFrom } from 'kysely/helpers/postgres';
import { DateTime } from 'luxon';
import type { Db } from '@server/db/database';
import type { Booking, HoursRule, Scenario } from '@shared/engine/engine';
import type { Salon } from '@shared/schemas/salon.schemas';
import { listSalonHours } from '../salon';
import { formatIso, parseLocalDate, zoneClock } from '@shared/engine/local-time';
import { localDateTimeOf } from '@shared/time/salon-time';

/** What planning needs of the salon row; callers pass the salon they already hold. */
export type PlanningSalon = Pick<Salon, 'id' | 'timeZone' | 'granularityMinutes'>;

export interface Horizon {
  /** Local dates in the salon's zone; `to` is exclusive. */
  from: string;
  to: string;
}

interface Named {
  id: string;
  name: string;
}

/**
 * The part of a salon's calendars that does not depend on the days asked about: opening hours, the active stylists
 * with their skills, client cap and working hours, and the active chairs and basins, with display names.
 */
export interface SalonSetup {
  salonHours: HoursRule[];
  stylists: Array<Named & { skills: string[]; maxClientsAtOnce: number; hours: HoursRule[] }>;
  chairs: Named[];
  basins: Named[];
}

interface Period {
  start: string;
  end: string;
}

/** The part that does: time off, chairs and basins out of service, and every live booking step, over a horizon. */
export interface SalonBook {
  horizon: Horizon;
  timeOff: Map<string, Period[]>;
  outOfService: Map<string, Period[]>;
  bookings: Booking[];
  /** The booking_steps ids of each booking above (a sitting), in the order of its steps. */
  stepIds: Map<string, string[]>;
}

export interface BookOptions {
  /** A booking left out (a booking being moved must not collide with itself). */
  except?: string;
  /** False leaves unpaid online holds out, for figures: a hold keeps a time for a few minutes, it is not work. */
  holds?: boolean;
}

/** A wall-clock `YYYY-MM-DDTHH:mm` in the salon's zone, the engine's input format. */
const hhmm = (t: string) => t.slice(0, 5);

/** The salon's zone and grid, for a caller that holds only the salon's id. */
export async function planningSalon(db: Db, salonId: string): Promise<PlanningSalon> {
  const row = await db.selectFrom('salons').select(['id', 'time_zone', 'granularity_minutes']).where('id', '=', salonId).executeTakeFirstOrThrow();
  return { id: row.id, timeZone: row.time_zone, granularityMinutes: row.granularity_minutes };
}

/** One statement per table; a stylist's working hours come inside the staff row. */
export async function loadSalonSetup(db: Db, salonId: string): Promise<SalonSetup> {
  const [salonHours, staff, chairs, basins] = await Promise.all([
    listSalonHours(db, salonId),
    db
      .selectFrom('staff as s')
      .select((eb) => [
        's.id',
        's.display_name as name',
        's.skills',
        's.max_clients_at_once',
        jsonArrayFrom(
          eb
            .selectFrom('staff_hours as h')
            .select(['h.rrule', 'h.start_time', 'h.end_time'])
            .whereRef('h.staff_id', '=', 's.id')
            .orderBy('h.start_time')
            .orderBy('h.id'),
        ).as('hours'),
      ])
      .where('s.salon_id', '=', salonId)
      .where('s.active', '=', true)
      .orderBy('s.id')
      .execute(),
    db.selectFrom('chairs').select(['id', 'name']).where('salon_id', '=', salonId).where('active', '=', true).orderBy('name').execute(),
    db.selectFrom('basins').select(['id', 'name']).where('salon_id', '=', salonId).where('active', '=', true).orderBy('name').execute(),
  ]);
  return {
    salonHours,
    stylists: staff.map((s) => ({
      id: s.id,
      name: s.name,
      skills: s.skills,
      maxClientsAtOnce: s.max_clients_at_once,
      hours: s.hours.map((h) => ({ rrule: h.rrule, start: hhmm(h.start_time), end: hhmm(h.end_time) })),
    })),
    chairs,
    basins,
  };
}

/**
 * The book over a horizon for the setup's stylists and units (time off and closures cut to the horizon). The setup may
 * still be on its way: only the time off waits for its stylists, the booked steps and closures are read at once.
 */
export async function loadSalonBook(
  db: Db,
  salon: PlanningSalon,
  setup: SalonSetup | Promise<SalonSetup>,
  horizon: Horizon,
  { except, holds = true }: BookOptions = {},
): Promise<SalonBook> {
  const zone = salon.timeZone;
  const from = DateTime.fromISO(horizon.from, { zone }).toJSDate();
  const to = DateTime.fromISO(horizon.to, { zone }).toJSDate();
  const range = sql`tstzrange(${from}, ${to}, '[)')`;
  const timeOffOf = (staffIds: string[]) =>
    staffIds.length === 0
      ? []
      : db
          .selectFrom('time_off')
          .select([
            'staff_id',
            sql<Date>`greatest(lower(during), ${from}::timestamptz)`.as('start'),
            sql<Date>`least(upper(during), ${to}::timestamptz)`.as('end'),
          ])
          .where('staff_id', 'in', staffIds)
          .where(sql<boolean>`during && ${range}`)
          .execute();
  const [timeOff, steps, closures] = await Promise.all([
    Promise.resolve(setup).then((s) => timeOffOf(s.stylists.map((st) => st.id))),
    db
      .selectFrom('booking_steps as st')
      .innerJoin('sittings as si', 'si.id', 'st.sitting_id')
      .innerJoin('bookings as b', 'b.id', 'si.booking_id')
      // UTC minutes (cut to the minute, as the wall-clock text is) as plain integers: cheap to send and parse.
      .select([
        'si.id as sittingId',
        'st.id as stepId',
        'b.stylist_id',
        'si.chair_id',
        'st.kind',
        'st.basin_id',
        sql<number>`floor(extract(epoch from lower(st.during)) / 60)::int`.as('start'),
        sql<number>`floor(extract(epoch from upper(st.during)) / 60)::int`.as('end'),
      ])
      .where('b.salon_id', '=', salon.id)
      .where('st.live', '=', true)
      .where('b.id', '!=', except ?? '00000000-0000-0000-0000-000000000000')
      .$if(!holds, (q) => q.where('b.status', '!=', 'held'))
      .where(sql<boolean>`si.during && ${range}`)
      .orderBy('si.id')
      .orderBy('st.seq')
      .execute(),
    db
      .selectFrom('out_of_service')
      .select([
        'chair_id',
        'basin_id',
        sql<Date>`greatest(lower(during), ${from}::timestamptz)`.as('start'),
        sql<Date>`least(upper(during), ${to}::timestamptz)`.as('end'),
      ])
      .where('salon_id', '=', salon.id)
      .where(sql<boolean>`during && ${range}`)
      .execute(),
  ]);
  const period = (p: { start: Date; end: Date }) => ({ start: localDateTimeOf(p.start, zone), end: localDateTimeOf(p.end, zone) });
  const byOwner = <T extends { start: Date; end: Date }>(rows: T[], owner: (row: T) => string | null) => {
    const map = new Map<string, Period[]>();
    for (const row of rows) {
      const id = owner(row);
      if (!id) continue;
      const list = map.get(id);
      if (list) list.push(period(row));
      else map.set(id, [period(row)]);
    }
    return map;
  };
  // The engine's own offset table for the zone turns minutes into wall-clock text; luxon per instant is slow.
  const clock = zoneClock(zone, parseLocalDate(horizon.from)!, parseLocalDate(horizon.to)!);
  const local = (utc: number) => formatIso(utc, clock.offsetAt(utc)).slice(0, 16);
  const bookings = new Map<string, Booking>();
  const stepIds = new Map<string, string[]>();
  for (const s of steps) {
    const booking = bookings.get(s.sittingId) ?? { id: s.sittingId, stylist: s.stylist_id, chair: s.chair_id, steps: [] };
    const times = { start: local(s.start), end: local(s.end) };
    booking.steps.push(s.kind === 'basin' ? { kind: 'basin', ...times, basin: s.basin_id! } : { kind: s.kind, ...times });
    bookings.set(s.sittingId, booking);
    stepIds.set(s.sittingId, [...(stepIds.get(s.sittingId) ?? []), s.stepId]);
  }
  return {
    horizon,
    timeOff: byOwner(timeOff, (t) => t.staff_id),
    outOfService: byOwner(closures, (c) => c.chair_id ?? c.basin_id),
    bookings: [...bookings.values()],
    stepIds,
  };
}

/**
 * The book over a longer horizon from the same first day: only the added days are read, and a sitting that
 * reaches across the seam (read twice) is kept once. Time off and closures cut at the seam join up again in the
 * engine, which unites touching periods.
 */
export async function extendSalonBook(
  db: Db,
  salon: PlanningSalon,
  setup: SalonSetup,
  book: SalonBook,
  to: string,
  options: BookOptions = {},
): Promise<SalonBook> {
  const more = await loadSalonBook(db, salon, setup, { from: book.horizon.to, to }, options);
  const join = (a: Map<string, Period[]>, b: Map<string, Period[]>) => {
    const out = new Map(a);
    for (const [id, periods] of b) out.set(id, [...(out.get(id) ?? []), ...periods]);
    return out;
  };
  const seen = new Set(book.bookings.map((b) => b.id));
  return {
    horizon: { from: book.horizon.from, to },
    timeOff: join(book.timeOff, more.timeOff),
    outOfService: join(book.outOfService, more.outOfService),
    bookings: [...book.bookings, ...more.bookings.filter((b) => !seen.has(b.id))],
    stepIds: new Map([...more.stepIds, ...book.stepIds]),
  };
}

/** Setup and book as the engine's scenario (without a request; window fits are added by the caller that needs them). */
export function calendarsOf(salon: PlanningSalon, setup: SalonSetup, book: SalonBook): Scenario {
  return {
    timeZone: salon.timeZone,
    granularityMinutes: salon.granularityMinutes,
    horizon: book.horizon,
    salonHours: setup.salonHours,
    stylists: setup.stylists.map((s) => ({
      id: s.id,
      skills: s.skills,
      maxClientsAtOnce: s.maxClientsAtOnce,
      hours: s.hours,
      timeOff: book.timeOff.get(s.id) ?? [],
    })),
    chairs: setup.chairs.map((c) => ({ id: c.id, outOfService: book.outOfService.get(c.id) ?? [] })),
    basins: setup.basins.map((b) => ({ id: b.id, outOfService: book.outOfService.get(b.id) ?? [] })),
    bookings: book.bookings,
    fits: [],
  };
}
