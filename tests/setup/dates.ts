import { DateTime, type WeekdayNumbers } from 'luxon';

/** A local date `weeksAhead` weeks from now on the given weekday (1 = Monday … 7 = Sunday), as YYYY-MM-DD. */
export function futureWeekday(weekday: WeekdayNumbers, weeksAhead: number, zone = 'America/Denver'): string {
  const today = DateTime.now().setZone(zone).startOf('day');
  return today.plus({ weeks: weeksAhead }).set({ weekday }).toISODate()!;
}

/** `date` at local `hh:mm` in the zone, as ISO 8601 with offset (what the API answers). */
export function localIso(date: string, hhmm: string, zone = 'America/Denver'): string {
  return DateTime.fromISO(`${date}T${hhmm}`, { zone }).toISO({ suppressMilliseconds: true, suppressSeconds: true })!;
}
