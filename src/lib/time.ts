import { DateTime } from 'luxon';

/*
 * Every time on screen is shown in the salon's time zone (not the device's),
 * because that is where the chair is.
 */

const at = (iso: string, zone: string) => DateTime.fromISO(iso, { zone });

export function formatTime(iso: string, zone: string): string {
  return at(iso, zone).toLocaleString(DateTime.TIME_SIMPLE);
}

export function formatTimeRange(startIso: string, endIso: string, zone: string): string {
  return `${formatTime(startIso, zone)} – ${formatTime(endIso, zone)}`;
}

/** "9:00 PM" for a clock time `HH:mm` (a salon setting, not an instant). */
export function formatClock(hhmm: string): string {
  return DateTime.fromISO(`2000-01-01T${hhmm}`).toLocaleString(DateTime.TIME_SIMPLE);
}

/** "Tue, Mar 2, 2027" for an instant, in the salon's zone. */
export function formatDay(iso: string, zone: string): string {
  return at(iso, zone).toLocaleString(DateTime.DATE_MED_WITH_WEEKDAY);
}

/** "Tuesday, March 2, 2027" for a local date `YYYY-MM-DD`. */
export function formatLocalDate(date: string): string {
  return DateTime.fromISO(date).toLocaleString(DateTime.DATE_HUGE);
}

export function localDateOf(iso: string, zone: string): string {
  return at(iso, zone).toISODate() ?? '';
}

export function todayIn(zone: string): string {
  return DateTime.now().setZone(zone).toISODate() ?? '';
}

export function shiftLocalDate(date: string, days: number): string {
  return DateTime.fromISO(date).plus({ days }).toISODate() ?? date;
}

/** Minutes from local midnight of `date` in the zone (handles days when clocks change). */
export function minutesIntoDay(iso: string, date: string, zone: string): number {
  const midnight = DateTime.fromISO(date, { zone }).startOf('day');
  return Math.round(at(iso, zone).diff(midnight, 'minutes').minutes);
}

export function minutesBetween(startIso: string, endIso: string): number {
  return Math.round(DateTime.fromISO(endIso).diff(DateTime.fromISO(startIso), 'minutes').minutes);
}

/** "Mountain Daylight Time (America/Denver)": the zone's everyday name on that date, and its id. */
export function zoneLabel(zone: string, date?: string): string {
  const moment = date ? DateTime.fromISO(date, { zone }).set({ hour: 12 }) : DateTime.now().setZone(zone);
  return `${moment.offsetNameLong ?? zone} (${zone})`;
}

export function isPast(iso: string): boolean {
  return DateTime.fromISO(iso) < DateTime.now();
}

/** A local date and clock time in the zone as an ISO instant with its offset, or null when it is not a real date. */
export function localToInstant(date: string, time: string, zone: string): string | null {
  const moment = DateTime.fromISO(`${date}T${time}`, { zone });
  return moment.isValid ? moment.toISO({ suppressMilliseconds: true }) : null;
}

/** "7 h 30 min", "45 min". */
export function formatMinutes(total: number): string {
  const hours = Math.floor(total / 60);
  const minutes = total % 60;
  if (hours === 0) return `${minutes} min`;
  return minutes === 0 ? `${hours} h` : `${hours} h ${minutes} min`;
}
