/**
 * Which local dates a working-hours rule falls on.
 *
 * `rrule` computes on "floating" dates: a JS Date whose UTC fields are read as the local wall
 * clock. We therefore hand it floating values in the salon's zone and read the occurrence dates
 * back from the UTC fields; the time of day of an occurrence is ignored (hours carry their own
 * start/end). A bare rule counts from horizon.from, which matters for INTERVAL and COUNT.
 */
import { rrule as rr } from './rrule-package';
import { DateTime } from 'luxon';
import type { ZoneClock } from './local-time';

export class RecurrenceError extends Error {}

const VALUE_RE = /^(\d{4})(\d{2})(\d{2})(?:T(\d{2})(\d{2})(\d{2})(Z)?)?$/;

const floating = (localMinute: number): Date => new Date(localMinute * 60_000);

/** Parses an iCalendar DATE or DATE-TIME into salon-local minutes. */
function toLocalMinute(value: string, tzid: string | null, clock: ZoneClock): number {
  const m = VALUE_RE.exec(value.trim());
  if (!m) throw new RecurrenceError(`"${value}" is not an iCalendar date or date-time`);
  // VALUE_RE always captures the date; the time groups are optional.
  const [y, mo, d, h = '0', mi = '0', s = '0'] = m.slice(1) as [string, string, string, string?, string?, string?];
  const wall = Date.UTC(+y, +mo - 1, +d, +h, +mi, +s) / 60_000;
  if (m[7] === 'Z') return wall + clock.offsetAt(wall);
  if (tzid && tzid !== clock.zone) {
    const dt = DateTime.fromObject({ year: +y, month: +mo, day: +d, hour: +h, minute: +mi, second: +s }, { zone: tzid });
    if (!dt.isValid) throw new RecurrenceError(`unknown TZID "${tzid}"`);
    const utc = dt.toMillis() / 60_000;
    return utc + clock.offsetAt(utc);
  }
  return wall;
}

function parseRule(text: string, dtstart: number, clock: ZoneClock) {
  if (!/(^|;)FREQ=/i.test(text)) throw new RecurrenceError(`"${text}" has no FREQ`);
  let options;
  try {
    options = rr.RRule.parseString(text);
  } catch (e) {
    throw new RecurrenceError(`"${text}" does not parse: ${(e as Error).message}`);
  }
  // UNTIL is an instant (UTC) when written with Z; rrule compares floating values, so convert it.
  const until = /UNTIL=([0-9TZ]+)/i.exec(text);
  if (until?.[1] !== undefined) options.until = floating(toLocalMinute(until[1], null, clock));
  delete options.tzid;
  try {
    return new rr.RRule({ ...options, dtstart: floating(dtstart) });
  } catch (e) {
    throw new RecurrenceError(`"${text}" is not a valid rule: ${(e as Error).message}`);
  }
}

function splitLine(line: string): { name: string; tzid: string | null; value: string } {
  const colon = line.indexOf(':');
  if (colon < 0) throw new RecurrenceError(`line "${line}" has no ":"`);
  // split always returns at least one piece.
  const [name, ...params] = line.slice(0, colon).split(';') as [string, ...string[]];
  const tz = params.find((p) => p.toUpperCase().startsWith('TZID='));
  return { name: name.toUpperCase(), tzid: tz ? tz.slice(5) : null, value: line.slice(colon + 1) };
}

/** Builds the rule set for a bare rule or RFC 5545 text (DTSTART, RRULE, RDATE, EXDATE lines). */
export function buildRuleSet(text: string, horizonFromDay: number, clock: ZoneClock) {
  const set = new rr.RRuleSet();
  const exDays = new Set<number>();
  const lines = text
    .split(/\r?\n/)
    .map((l) => l.trim())
    .filter((l) => l.length > 0);
  const [only] = lines;
  if (lines.length === 1 && only !== undefined && !only.includes(':')) {
    set.rrule(parseRule(only, horizonFromDay * 1440, clock));
    return { set, exDays };
  }
  const parsed = lines.map(splitLine);
  const start = parsed.find((l) => l.name === 'DTSTART');
  const dtstart = start ? toLocalMinute(start.value, start.tzid, clock) : horizonFromDay * 1440;
  let rules = 0;
  for (const line of parsed) {
    const values = line.value.split(',');
    if (line.name === 'RRULE') {
      set.rrule(parseRule(line.value, dtstart, clock));
      rules++;
    } else if (line.name === 'EXDATE') {
      // Excluded by local date: occurrence times of day are not used, so neither is EXDATE's.
      for (const v of values) exDays.add(Math.floor(toLocalMinute(v, line.tzid, clock) / 1440));
    } else if (line.name === 'RDATE') {
      for (const v of values) set.rdate(floating(toLocalMinute(v, line.tzid, clock)));
      rules++;
    } else if (line.name !== 'DTSTART') {
      throw new RecurrenceError(`unsupported line "${line.name}"`);
    }
  }
  if (rules === 0) throw new RecurrenceError('no RRULE or RDATE line');
  return { set, exDays };
}

// Expansion depends only on (zone, rule, horizon), and a salon asks with the same hours rules
// query after query; rrule's iterator is the slowest part of building an index, so keep results.
const memo = new Map<string, number[]>();
const MEMO_LIMIT = 2_000;

/** Local day numbers in [fromDay, toDay) on which the rule has an occurrence (memoised). */
export function ruleDays(text: string, fromDay: number, toDay: number, clock: ZoneClock): number[] {
  const key = `${clock.zone}|${fromDay}|${toDay}|${text}`;
  let days = memo.get(key);
  if (!days) {
    days = expandRule(text, fromDay, toDay, clock);
    if (memo.size >= MEMO_LIMIT) memo.clear();
    memo.set(key, days);
  }
  return days;
}

/** Local day numbers in [fromDay, toDay) on which the rule falls, without the memo. */
export function expandRule(text: string, fromDay: number, toDay: number, clock: ZoneClock): number[] {
  const { set, exDays } = buildRuleSet(text, fromDay, clock);
  const dates = set.between(floating(fromDay * 1440), floating(toDay * 1440 - 1), true);
  const days = dates.map((d) => Math.floor(d.getTime() / 86_400_000));
  return [...new Set(days)].filter((d) => !exDays.has(d)).sort((a, b) => a - b);
}
