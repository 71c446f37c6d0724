/**
 * Opening and working hours as the set-up screens edit them: weekdays, optionally every other week
 * from a start date, and closed dates, written as RFC 5545 text (DTSTART / RRULE / EXDATE lines)
 * that recurrence.ts expands. Rules written by hand that do not fit this shape stay as text.
 */
import { buildRuleSet, expandRule, RecurrenceError, ruleDays } from './recurrence';
import { parseLocalDate, zoneClock } from './local-time';

export const WEEKDAY_CODES = ['MO', 'TU', 'WE', 'TH', 'FR', 'SA', 'SU'] as const;
export type WeekdayCode = (typeof WEEKDAY_CODES)[number];

export interface WeeklyRule {
  weekdays: WeekdayCode[];
  everyOtherWeek: boolean;
  /** First week of an every-other-week rule (YYYY-MM-DD); unused otherwise. */
  startsOn: string | null;
  /** Dates the rule skips (holidays, closures), YYYY-MM-DD. */
  closedDates: string[];
}

const compact = (date: string) => date.replaceAll('-', '');
const dashed = (date: string) => `${date.slice(0, 4)}-${date.slice(4, 6)}-${date.slice(6, 8)}`;

export function composeWeeklyRule(rule: WeeklyRule): string {
  const days = WEEKDAY_CODES.filter((d) => rule.weekdays.includes(d)).join(',');
  const rrule = `FREQ=WEEKLY${rule.everyOtherWeek ? ';INTERVAL=2' : ''};BYDAY=${days}`;
  const closed = [...new Set(rule.closedDates)].sort();
  if (!rule.everyOtherWeek && closed.length === 0) return rrule;
  const lines = [];
  // INTERVAL counts from DTSTART (RFC 5545 §3.3.10), so every other week needs a first week.
  if (rule.everyOtherWeek && rule.startsOn) lines.push(`DTSTART;VALUE=DATE:${compact(rule.startsOn)}`);
  lines.push(`RRULE:${rrule}`);
  if (closed.length > 0) lines.push(`EXDATE;VALUE=DATE:${closed.map(compact).join(',')}`);
  return lines.join('\n');
}

/** The structured view of a rule, or null when it uses anything the weekday editor cannot show. */
export function readWeeklyRule(text: string): WeeklyRule | null {
  const lines = text
    .split(/\r?\n/)
    .map((l) => l.trim())
    .filter(Boolean);
  let rrule: string | null = null;
  let startsOn: string | null = null;
  const closedDates: string[] = [];
  for (const line of lines) {
    const upper = line.toUpperCase();
    if (!line.includes(':') && lines.length === 1) rrule = upper;
    else if (upper.startsWith('RRULE:')) rrule = upper.slice(6);
    else if (/^DTSTART;VALUE=DATE:\d{8}$/.test(upper)) startsOn = dashed(upper.slice(-8));
    else if (/^EXDATE;VALUE=DATE:\d{8}(,\d{8})*$/.test(upper))
      closedDates.push(
        ...upper
          .slice(upper.indexOf(':') + 1)
          .split(',')
          .map(dashed),
      );
    else return null;
  }
  if (!rrule) return null;
  const parts = new Map(rrule.split(';').map((p) => p.split('=') as [string, string]));
  const known = ['FREQ', 'INTERVAL', 'BYDAY'];
  if (parts.get('FREQ') !== 'WEEKLY' || [...parts.keys()].some((k) => !known.includes(k))) return null;
  const interval = parts.get('INTERVAL') ?? '1';
  if (interval !== '1' && interval !== '2') return null;
  const weekdays = (parts.get('BYDAY') ?? '').split(',').filter(Boolean);
  if (weekdays.length === 0 || weekdays.some((d) => !WEEKDAY_CODES.includes(d as WeekdayCode))) return null;
  return { weekdays: weekdays as WeekdayCode[], everyOtherWeek: interval === '2', startsOn, closedDates };
}

/**
 * Why a rule cannot be used, or null when it works. The text is read back the way every reader reads it
 * (parsed, then expanded over a year) before it may be stored, so a saved rule cannot fail later.
 */
export function ruleProblem(text: string): string | null {
  try {
    const day = parseLocalDate('2027-01-01')!;
    buildRuleSet(text, day, zoneClock('UTC', day, day + 1));
    expandRule(text, day, day + 366, zoneClock('UTC', day, day + 366));
    return null;
  } catch (e) {
    if (e instanceof RecurrenceError) return e.message;
    return `does not parse: ${(e as Error).message}`;
  }
}

const isoDay = (day: number) => new Date(day * 86_400_000).toISOString().slice(0, 10);

/** The next `count` dates (YYYY-MM-DD, in the zone) the rule falls on from `fromDate`, within a year. */
export function nextDates(text: string, zone: string, fromDate: string, count: number): string[] {
  const from = parseLocalDate(fromDate);
  if (from === null) return [];
  return ruleDays(text, from, from + 366, zoneClock(zone, from, from + 366))
    .slice(0, count)
    .map(isoDay);
}
