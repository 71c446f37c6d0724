import type { Availability } from '@shared/schemas/online-booking.schemas';
import { formatDate, formatTime } from '@shared/format/date-time';
import { formatFor, zonelessFormat } from '@shared/format/locale';
import { localDateOf, shiftLocalDate } from '@shared/time/salon-time';

export type FreeTime = Availability['times'][number];
export type FreeDay = { date: string; times: FreeTime[] };

/**
 * Free times grouped by the salon-local day they start on, days and times earliest
 * first. The salon's zone decides the day (never the device's, never UTC), so a late
 * evening start stays on its own day and the clock-change days group correctly.
 */
export function groupTimesByDay(times: readonly FreeTime[], zone: string): FreeDay[] {
  const sorted = [...times].sort((a, b) => Date.parse(a.start) - Date.parse(b.start) || a.stylistName.localeCompare(b.stylistName));
  const days = new Map<string, FreeTime[]>();
  for (const time of sorted) {
    const date = localDateOf(time.start, zone);
    const day = days.get(date);
    if (day) day.push(time);
    else days.set(date, [time]);
  }
  return [...days].map(([date, list]) => ({ date, times: list }));
}

/** "Tuesday 8 December" for a local date `YYYY-MM-DD`. */
export function dayLabel(date: string): string {
  return formatDate(date, zonelessFormat, { year: false });
}

/** "Tue 8 Dec": the short form for date chips on a phone. */
export function shortDayLabel(date: string): string {
  return formatDate(date, zonelessFormat, { width: 'short', year: false });
}

/** "Tuesday 8 December, 10:00 AM with Ana Moreno": what a time button is announced as. */
export function freeTimeLabel(time: FreeTime, zone: string): string {
  return `${dayLabel(localDateOf(time.start, zone))}, ${formatTime(time.start, formatFor(zone))} with ${time.stylistName}`;
}

/** A stable key for one free time (the same start can be free with two stylists). */
export function freeTimeKey(time: Pick<FreeTime, 'start' | 'stylistId'>): string {
  return `${time.start}|${time.stylistId}`;
}

/** The local day after the last free time listed: where "look further ahead" starts. Undefined when none are listed. */
export function dayAfterLast(times: readonly FreeTime[], zone: string): string | undefined {
  const last = groupTimesByDay(times, zone).at(-1);
  return last ? shiftLocalDate(last.date, 1) : undefined;
}

/**
 * One time per start, earliest first: for a client who asked for any stylist, the same start free with two stylists
 * is one choice, not two buttons (the first stylist listed for it, by name, is the one held).
 */
export function oneTimePerStart(times: readonly FreeTime[]): FreeTime[] {
  const seen = new Set<number>();
  return [...times]
    .sort((a, b) => Date.parse(a.start) - Date.parse(b.start) || a.stylistName.localeCompare(b.stylistName))
    .filter((time) => {
      const at = Date.parse(time.start);
      if (seen.has(at)) return false;
      seen.add(at);
      return true;
    });
}
