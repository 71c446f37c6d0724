import { DateTime } from 'luxon';
import type { Db } from '@server/db/database';
import type { Availability } from '@shared/schemas/online-booking.schemas';
import type { ServiceSummary } from '@shared/schemas/service.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { findService } from '../services';
import { localEarliest, optionsFor } from '../planning';
import { daysFrom, type DayRange } from '../book-version';

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

/** Where a search starts: the first local day searched and the earliest start (`local`: on the salon's grid). */
function searchStart(salon: SalonRow, from: string | undefined, now: Date) {
  const fromDay = firstDay(salon.time_zone, from, now);
  const earliest = new Date(Math.max(now.getTime(), fromDay.toMillis()));
  return { fromDay, earliest, local: localEarliest(earliest, salon.time_zone, salon.granularity_minutes) };
}

/** The local dates a free-times search may look at: the book over them is what its answer depends on. */
export function freeTimesDays(zone: string, from: string | undefined, now: Date): DayRange {
  return daysFrom(firstDay(zone, from, now).toISODate()!, ONLINE_DAYS);
}

/** Everything a free-times answer depends on besides the salon's book: its cache key. */
export function freeTimesKey(salon: SalonRow, serviceId: string, stylistId: string | undefined, from: string | undefined, now: Date): string {
  const { fromDay, local } = searchStart(salon, from, now);
  return `free-times|${serviceId}|${stylistId ?? 'any'}|${fromDay.toISODate()}|${local}`;
}

/** Every free start (on the grid) for one service (or one sitting's steps), one stylist or any, over the next three weeks. */
export async function freeTimes(
  db: Db,
  salon: SalonRow,
  service: Pick<ServiceSummary, 'skill' | 'stepPlan'>,
  stylistId: string | undefined,
  from: string | undefined,
  now: Date,
  except?: string,
): Promise<Availability> {
  const zone = salon.time_zone;
  const { fromDay, earliest } = searchStart(salon, from, now);
  const horizon = (days: number) => ({ from: fromDay.toISODate()!, to: fromDay.plus({ days }).toISODate()! });
  // The engine walks day by day and stops at MAX_TIMES, and with one sitting each day's times depend on that day's
  // book alone: a busy salon fills the list within the first week, and loading (and indexing) three weeks of its
  // book for that was most of the request's cost. So the first week is tried first; the rest is read only if needed.
  const { options, names } = await optionsFor(
    db,
    { id: salon.id, timeZone: zone, granularityMinutes: salon.granularity_minutes },
    {
      skill: service.skill,
      stylistId: stylistId ?? null,
      plan: service.stepPlan,
      earliest,
      horizons: service.stepPlan.sittings.length === 1 ? [horizon(FIRST_DAYS), horizon(ONLINE_DAYS)] : [horizon(ONLINE_DAYS)],
      limit: MAX_TIMES,
      spread: 'none',
      except,
    },
  );
  return {
    timeZone: zone,
    times: options.map((o) => {
      // The engine places at least one sitting, each with at least one step.
      const steps = o.sittings[0]!.steps;
      return { start: steps[0]!.start, end: steps[steps.length - 1]!.end, stylistId: o.stylist, stylistName: names.stylists.get(o.stylist) ?? '' };
    }),
  };
}

export async function onlineService(db: Db, salonId: string, serviceId: string): Promise<ServiceSummary> {
  const service = await findService(db, salonId, serviceId);
  if (!service || !service.onlineBookable) throw notFound('That service');
  if (service.stepPlan.sittings.length !== 1) throw new AppError('NOT_BOOKABLE', 409, 'This service is booked with the salon after a consultation.');
  return service;
}
