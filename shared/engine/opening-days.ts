/**
 * The salon's opening hours per local date, as the calendars draw them: which dates it opens, from when to when.
 * The same rules and the same expansion (ruleDays, RFC 5545 with EXDATE closed dates) the engine plans with, so a
 * calendar never shows a date open that the engine treats as closed, or the other way round.
 */
import { parseLocalDate, zoneClock } from './local-time';
import { ruleDays } from './recurrence';
import type { HoursRule } from './scenario.schemas';

/** One stretch the salon is open, wall-clock `HH:mm` in its zone. */
export type OpenSpan = { start: string; end: string };
export type OpeningDay = { date: string; hours: OpenSpan[] };

const isoDay = (day: number) => new Date(day * 86_400_000).toISOString().slice(0, 10);

/** Overlapping or touching stretches of one date joined, earliest first (two lines of hours may overlap). */
function merge(spans: OpenSpan[]): OpenSpan[] {
  const sorted = [...spans].sort((a, b) => a.start.localeCompare(b.start));
  const out: OpenSpan[] = [];
  for (const span of sorted) {
    const last = out.at(-1);
    if (last && span.start <= last.end) last.end = span.end > last.end ? span.end : last.end;
    else out.push({ ...span });
  }
  return out;
}

/** `count` dates from `from` (YYYY-MM-DD), each with the hours the salon is open that date (none: closed). */
export function openingDays(rules: readonly HoursRule[], zone: string, from: string, count: number): OpeningDay[] {
  const first = parseLocalDate(from);
  if (first === null) return [];
  const clock = zoneClock(zone, first, first + count);
  const byDay = new Map<number, OpenSpan[]>();
  for (const rule of rules) {
    for (const day of ruleDays(rule.rrule, first, first + count, clock)) byDay.set(day, [...(byDay.get(day) ?? []), { start: rule.start, end: rule.end }]);
  }
  return Array.from({ length: count }, (_, i) => ({ date: isoDay(first + i), hours: merge(byDay.get(first + i) ?? []) }));
}
