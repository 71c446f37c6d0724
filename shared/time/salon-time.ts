import { DateTime } from 'luxon';

/*
 * Between UTC instants and the salon's wall clock: the one place both sides convert. Instants are Dates
 * or ISO 8601 texts with an offset; wall-clock values are the engine's texts (`YYYY-MM-DD`,
 * `YYYY-MM-DDTHH:mm`, `HH:mm`) read in an IANA zone. The engine's own hot-path arithmetic stays in
 * shared/engine/local-time.ts. No clock here: "now" is always passed in.
 *
 * A wall time that falls in a spring-forward gap moves forward by the gap; one that happens twice at
 * fall-back is read with the offset after the change (the later instant). That is luxon's reading; the
 * engine's own rule for scenario times (docs/engine.md) is in shared/engine/local-time.ts.
 */

const at = (instant: Date | string, zone: string) =>
  typeof instant === 'string' ? DateTime.fromISO(instant, { zone }) : DateTime.fromJSDate(instant, { zone });

/** The salon's calendar date `YYYY-MM-DD` at an instant. */
export function localDateOf(instant: Date | string, zone: string): string {
  return at(instant, zone).toISODate() ?? '';
}

/** The salon's calendar date at `now`: "today" in that zone. */
export const todayIn = (zone: string, now: Date): string => localDateOf(now, zone);

/** The salon's wall-clock date and time `YYYY-MM-DDTHH:mm` at an instant (the engine's local form). */
export function localDateTimeOf(instant: Date | string, zone: string): string {
  return at(instant, zone).toFormat("yyyy-MM-dd'T'HH:mm");
}

/** The salon's wall-clock time `HH:mm` at an instant. */
export function localClockOf(instant: Date | string, zone: string): string {
  return at(instant, zone).toFormat('HH:mm');
}

/** The instant as ISO 8601 with the salon's offset at that instant, e.g. 2027-03-02T10:00:00-07:00. */
export function instantIso(instant: Date | string, zone: string): string {
  return at(instant, zone).toISO({ suppressMilliseconds: true }) ?? '';
}

/** The instant a local date (and wall-clock time, midnight when left out) happens in the zone, or null when the date is not real. */
export function instantAt(date: string, zone: string, time = '00:00'): Date | null {
  const local = DateTime.fromISO(`${date}T${time}`, { zone });
  return local.isValid ? local.toJSDate() : null;
}

/** The same as `instantAt`, as ISO 8601 with the offset of that day: 2027-07-12T10:15:00-06:00. */
export function localToInstant(date: string, time: string, zone: string): string | null {
  const local = DateTime.fromISO(`${date}T${time}`, { zone });
  return local.isValid ? local.toISO({ suppressMilliseconds: true }) : null;
}

/** A calendar date `days` later (or earlier): pure calendar arithmetic, no zone. */
export function shiftLocalDate(date: string, days: number): string {
  return DateTime.fromISO(date, { zone: 'UTC' }).plus({ days }).toISODate() ?? date;
}

/** Minutes from local midnight of `date` in the zone to the instant (right on days when clocks change). */
export function minutesIntoDay(instant: Date | string, date: string, zone: string): number {
  const midnight = DateTime.fromISO(date, { zone }).startOf('day');
  return Math.round(at(instant, zone).diff(midnight, 'minutes').minutes);
}
