import { DateTime } from 'luxon';

/*
 * The week calendar runs in UTC and is handed the salon's wall-clock times dressed
 * as UTC, so it draws 09:30 salon time at 09:30 whatever the device's zone is, and
 * days when the clocks change keep their real length in the salon. These two
 * functions translate in and out; they are exact inverses except for times that do
 * not exist in the salon's zone (spring-forward), which move forward to a real time.
 */

/** An instant as the salon's wall-clock time, written as a UTC ISO string for the calendar. */
export function toCalendarTime(iso: string, zone: string): string {
  const local = DateTime.fromISO(iso, { zone });
  const { year, month, day, hour, minute, second } = local;
  return DateTime.fromObject({ year, month, day, hour, minute, second }, { zone: 'utc' }).toISO({ suppressMilliseconds: true }) ?? iso;
}

/** A calendar Date (UTC fields = salon wall clock) back to a real instant, ISO with the salon's offset. */
export function fromCalendarTime(date: Date, zone: string): string {
  const wall = DateTime.fromJSDate(date, { zone: 'utc' });
  const { year, month, day, hour, minute, second } = wall;
  const real = DateTime.fromObject({ year, month, day, hour, minute, second }, { zone });
  return real.toISO({ suppressMilliseconds: true }) ?? '';
}
