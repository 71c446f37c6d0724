/**
 * Opening or working hours in plain words for clients and staff ("Tuesday to Saturday, closed on
 * Thu 24 Dec 2026"). Never throws: a rule it cannot put into words reads as the salon's set days,
 * so no stored rule can take a page down.
 */
import { rrule as rr } from './rrule-package';
import { readWeeklyRule, WEEKDAY_CODES, type WeekdayCode } from './weekly-rule';
import { formatDate } from '../format/date-time';
import { zonelessFormat } from '../format/locale';

const dayWords: Record<WeekdayCode, string> = {
  MO: 'Monday',
  TU: 'Tuesday',
  WE: 'Wednesday',
  TH: 'Thursday',
  FR: 'Friday',
  SA: 'Saturday',
  SU: 'Sunday',
};

const dateWords = (date: string) => formatDate(date, zonelessFormat, { width: 'short' });

/** "Monday, Wednesday and Friday"; three or more days in a row read as "Tuesday to Saturday". */
export function describeWeekdays(days: readonly WeekdayCode[]): string {
  const ordered = WEEKDAY_CODES.filter((d) => days.includes(d));
  const [head] = ordered;
  if (head === undefined) return '';
  const first = WEEKDAY_CODES.indexOf(head);
  const inARow = ordered.every((d, i) => WEEKDAY_CODES.indexOf(d) === first + i);
  if (ordered.length >= 3 && inARow) return `${dayWords[head]} to ${dayWords[ordered[ordered.length - 1]!]}`;
  return listWords(ordered.map((d) => dayWords[d]));
}

function listWords(items: string[]): string {
  return items.length <= 1 ? (items[0] ?? '') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

/**
 * The days of an hours rule in words. Closed dates before `fromDate` (YYYY-MM-DD) are left out:
 * a client does not need last year's holidays.
 */
export function describeHoursRule(text: string, fromDate = '0000-01-01'): string {
  const weekly = readWeeklyRule(text);
  if (weekly) {
    const every = weekly.everyOtherWeek
      ? `Every other week${weekly.startsOn ? ` (counting from the week of ${dateWords(weekly.startsOn)})` : ''}: ${describeWeekdays(weekly.weekdays)}`
      : describeWeekdays(weekly.weekdays);
    const closed = weekly.closedDates.filter((d) => d >= fromDate).sort();
    return closed.length ? `${every}; closed on ${listWords(closed.map(dateWords))}` : every;
  }
  return otherRuleWords(text);
}

/** A rule the weekday editor cannot show: rrule's own English for its RRULE line, when it has one. */
function otherRuleWords(text: string): string {
  const line = text
    .split(/\r?\n/)
    .map((l) => l.trim())
    .find((l) => /^(RRULE:)?FREQ=/i.test(l));
  if (!line) return 'On set days';
  try {
    const words = rr.RRule.fromString(line.replace(/^RRULE:/i, '')).toText();
    return words.charAt(0).toUpperCase() + words.slice(1);
  } catch {
    return 'On set days';
  }
}
