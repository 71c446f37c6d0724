import { DateTime } from 'luxon';
import type { Db } from '../../db/database';
import type { Availability } from '../../../shared/schemas/online-booking.schemas';
import type { ServiceSummary } from '../../../shared/schemas/service.schemas';
import { planOptions } from '../../../shared/engine/engine';
import { AppError, notFound } from '../../lib/app-error';
import { findService } from '../services/services.repository';
import { loadSalonCalendars } from '../planning/salon-calendars.repository';
import { localEarliest, toEngineSittings } from '../planning/engine-request';
import { loadNames } from '../planning/names.repository';
import { daysFrom, type DayRange } from '../book-version/book-version.repository';

/** How far ahead online clients see free times. */
export const ONLINE_DAYS = 21;
const MAX_TIMES = 400;
const FIRST_DAYS = 7;

interface SalonRow {
  id: string;
  time_zone: string;
  granularity_minutes: number;
}

const firstDay = (zone: string, from: string | undefined, now: Date) =>
  DateTime.max(DateTime.fromISO(from ?? '1970-01-01', { zone }), DateTime.fromJSDate(now, { zone }).startOf('day'));

/** Where a search starts: the first local day searched and the earliest start on the salon's grid. */
function searchStart(salon: SalonRow, from: string | undefined, now: Date) {
  const fromDay = firstDay(salon.time_zone, from, now);
  const earliest = new Date(Math.max(now.getTime(), fromDay.toMillis()));
  return { fromDay, earliest: localEarliest(earliest, salon.time_zone, salon.granularity_minutes) };
}

/** The local dates a free-times search may look at: the book over them is what its answer depends on. */
export function freeTimesDays(zone: string, from: string | undefined, now: Date): DayRange {
  return daysFrom(firstDay(zone, from, now).toISODate()!, ONLINE_DAYS);
}

/** Everything a free-times answer depends on besides the salon's book: its cache key. */
export function freeTimesKey(salon: SalonRow, serviceId: string, stylistId: string | undefined, from: string | undefined, now: Date): string {
  const { fromDay, earliest } = searchStart(salon, from, now);
  return `free-times|${serviceId}|${stylistId ?? 'any'}|${fromDay.toISODate()}|${earliest}`;
}

/** Every free start (on the grid) for one service (or one sitting's steps), one stylist or any, over the next three weeks. */
export async function freeTimes(db: Db, salon: SalonRow, service: Pick<ServiceSummary, 'skill' | 'stepPlan'>, stylistId: string | undefined, from: string | undefined, now: Date, except?: string): Promise<Availability> {
  const zone = salon.time_zone;
  const { fromDay, earliest } = searchStart(salon, from, now);
  // The engine walks day by day and stops at MAX_TIMES, and with one sitting each
  // day's times depend on that day's book alone: a busy salon fills the list within the first week, and
  // loading (and indexing) three weeks of its book for that was most of the request's cost.
  const search = async (days: number) => {
    const horizon = { from: fromDay.toISODate()!, to: fromDay.plus({ days }).toISODate()! };
    const calendars = await loadSalonCalendars(db, salon.id, horizon, except);
    if (stylistId && !calendars.stylists.some((s) => s.id === stylistId)) {
      throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { stylistId: 'No such stylist in this salon.' });
    }
    return planOptions({
      ...calendars,
      request: { skill: service.skill, stylist: stylistId ?? null, earliest, sittings: toEngineSittings(service.stepPlan), limit: MAX_TIMES, spread: 'none' },
    }).options;
  };
  const oneSitting = service.stepPlan.sittings.length === 1;
  let options = oneSitting ? await search(FIRST_DAYS) : [];
  if (options.length < MAX_TIMES) options = await search(ONLINE_DAYS);
  const names = await loadNames(db, salon.id);
  return {
    timeZone: zone,
    times: options.map((o) => {
      const steps = o.sittings[0].steps;
      return { start: steps[0].start, end: steps[steps.length - 1].end, stylistId: o.stylist, stylistName: names.stylists.get(o.stylist) ?? '' };
    }),
  };
}

export async function onlineService(db: Db, salonId: string, serviceId: string): Promise<ServiceSummary> {
  const service = await findService(db, salonId, serviceId);
  if (!service || !service.onlineBookable) throw notFound('That service');
  if (service.stepPlan.sittings.length !== 1) throw new AppError('NOT_BOOKABLE', 409, 'This service is booked with the salon after a consultation.');
  return service;
}
