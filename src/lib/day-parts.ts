import { DateTime } from 'luxon';
import type { FreeTime } from './free-times';

export type DayPart = 'morning' | 'afternoon' | 'evening';
export const dayPartNames: Record<DayPart, string> = { morning: 'Morning', afternoon: 'Afternoon', evening: 'Evening' };

/** Minutes after local midnight as the salon's clock reads (09:30 is 570, also on a day the clocks change). */
const wallMinutes = (iso: string, zone: string) => {
  const local = DateTime.fromISO(iso, { zone });
  return local.hour * 60 + local.minute;
};

/** Morning before 12:00, afternoon from 12:00, evening from 17:00, by the salon's clock. */
export function dayPartOf(iso: string, zone: string): DayPart {
  const minutes = wallMinutes(iso, zone);
  return minutes < 12 * 60 ? 'morning' : minutes < 17 * 60 ? 'afternoon' : 'evening';
}

export type FreeDayPart = { part: DayPart; times: FreeTime[] };

/** One day's times (earliest first) split into the parts of the day that have any, in the day's order. */
export function groupTimesByPart(times: readonly FreeTime[], zone: string): FreeDayPart[] {
  const parts: FreeDayPart[] = [];
  for (const time of times) {
    const part = dayPartOf(time.start, zone);
    const last = parts.at(-1);
    if (last?.part === part) last.times.push(time);
    else parts.push({ part, times: [time] });
  }
  return parts;
}

// Steps a short list is spread over: the quarter hour first, then coarser, until the list is short enough.
const STEPS = [15, 30, 60, 120, 180];

/**
 * At most `max` of the times (earliest first), spread over the part of the day rather than bunched at its start: the
 * first free time in each quarter hour, or in each half hour, hour… — the finest step that keeps to `max`. Whatever
 * else is free stays one "more" away.
 */
export function spreadTimes(times: readonly FreeTime[], zone: string, max: number): FreeTime[] {
  if (times.length <= max) return [...times];
  for (const step of STEPS) {
    const firsts: FreeTime[] = [];
    let bucket = -1;
    for (const time of times) {
      const here = Math.floor(wallMinutes(time.start, zone) / step);
      if (here !== bucket) firsts.push(time);
      bucket = here;
    }
    if (firsts.length <= max) return firsts;
  }
  return times.slice(0, max);
}
