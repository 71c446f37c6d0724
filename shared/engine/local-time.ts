/**
 * Wall-clock ↔ UTC minutes for one IANA zone.
 *
 * The engine counts time in integer UTC minutes since 1970-01-01T00:00Z and local wall-clock
 * times as "local minutes" (the same count on a floating clock). Offsets come from luxon (which
 * reads the IANA database through Intl) once per horizon day; the per-value conversions are plain
 * arithmetic on that table, because calling luxon for thousands of booking times is slow.
 *
 * Rule for local times that are not one instant (RFC 5545 §3.3.5, documented in docs/engine.md):
 * - ambiguous (fall-back overlap): the first occurrence, i.e. the earlier offset;
 * - nonexistent (spring-forward gap): explicit date-times in a scenario are rejected; a recurring
 *   wall-clock time (working hours) that falls in a gap uses the offset before the gap, so 02:30 on
 *   a spring-forward day becomes 03:30.
 */
import { DateTime, IANAZone } from 'luxon';

const CLOCK_RE = /^(\d{2}):(\d{2})$/;

/** Days since 1970-01-01 of a valid calendar date, or null (proleptic Gregorian, pure arithmetic). */
export function dayNumber(year: number, month: number, day: number): number | null {
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return null;
  // Days-from-civil: count from 0000-03-01 so the leap day ends the year, then shift to 1970.
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yoe = y - era * 400;
  const doy = Math.floor((153 * (month + (month > 2 ? -3 : 9)) + 2) / 5) + day - 1;
  return era * 146_097 + yoe * 365 + Math.floor(yoe / 4) - Math.floor(yoe / 100) + doy - 719_468;
}

function daysInMonth(year: number, month: number): number {
  if (month !== 2) return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
  return year % 4 === 0 && (year % 100 !== 0 || year % 400 === 0) ? 29 : 28;
}

/** Digits of text[from, from + count) as a number, or -1 if any is not a digit. */
function digits(text: string, from: number, count: number): number {
  let value = 0;
  for (let i = from; i < from + count; i++) {
    const c = text.charCodeAt(i) - 48;
    if (c < 0 || c > 9) return -1;
    value = value * 10 + c;
  }
  return value;
}

/** "YYYY-MM-DD" → local day number, or null when malformed or not a real date. */
export function parseLocalDate(text: string): number | null {
  return text.length === 10 ? datePart(text) : null;
}

/** The YYYY-MM-DD at the start of text as a day number (no substring: this runs per booked step). */
function datePart(text: string): number | null {
  if (text.charCodeAt(4) !== 45 || text.charCodeAt(7) !== 45) return null;
  const y = digits(text, 0, 4);
  const m = digits(text, 5, 2);
  const d = digits(text, 8, 2);
  return y < 0 || m < 0 || d < 0 ? null : dayNumber(y, m, d);
}

/** "YYYY-MM-DDTHH:mm" → local minutes, or null. */
let lastDateText = '\u0000';
let lastDay: number | null = null;

export function parseLocalDateTime(text: string): number | null {
  if (text.length !== 16 || text.charCodeAt(10) !== 84 || text.charCodeAt(13) !== 58) return null;
  // Booked steps come in runs on the same date; skip the calendar arithmetic for a repeat.
  if (!text.startsWith(lastDateText)) {
    lastDateText = text.slice(0, 11);
    lastDay = datePart(text);
  }
  const day = lastDay;
  const hour = digits(text, 11, 2);
  const minute = digits(text, 14, 2);
  if (day === null || hour < 0 || minute < 0 || hour > 23 || minute > 59) return null;
  return day * 1440 + hour * 60 + minute;
}

/** "HH:mm" → minutes after local midnight; "24:00" is allowed as the end of a day. */
export function parseClock(text: string): number | null {
  const m = CLOCK_RE.exec(text);
  if (!m) return null;
  // Both groups of CLOCK_RE are mandatory.
  const minutes = +m[2]!;
  const value = +m[1]! * 60 + minutes;
  return minutes < 60 && value <= 1440 ? value : null;
}

// Zone validity and offsets are fixed facts of the tz database, so memoising them is safe; luxon
// builds an Intl formatter per validity check, which costs about a millisecond.
const knownZones = new Map<string, boolean>();
const offsetMemo = new Map<string, number>();

export function isKnownZone(zone: string): boolean {
  let known = knownZones.get(zone);
  if (known === undefined) {
    known = IANAZone.isValidZone(zone);
    knownZones.set(zone, known);
  }
  return known;
}

/** Offset (minutes east of UTC) at a UTC minute, from luxon (memoised). */
function luxonOffset(zone: string, utc: number): number {
  const key = `${zone}@${utc}`;
  let offset = offsetMemo.get(key);
  if (offset === undefined) {
    if (offsetMemo.size > 100_000) offsetMemo.clear();
    offset = DateTime.fromMillis(utc * 60_000, { zone }).offset;
    offsetMemo.set(key, offset);
  }
  return offset;
}

export interface ZoneClock {
  readonly zone: string;
  offsetAt(utc: number): number;
  /** Local minutes → UTC minutes; null for a nonexistent time when `gap` is 'reject'. */
  toUtc(local: number, gap: 'reject' | 'shift'): number | null;
  /** ISO 8601 with the UTC offset, e.g. 2027-03-03T10:00-07:00. */
  format(utc: number): string;
  /** Every offset change inside the table, as [utc minute, offset before, offset after]. */
  readonly changes: ReadonlyArray<readonly [number, number, number]>;
}

/** Builds a converter whose fast table covers local days [fromDay - 2, toDay + 2). */
export function zoneClock(zone: string, fromDay: number, toDay: number): ZoneClock {
  const lo = (fromDay - 2) * 1440 - 1440;
  const hi = (toDay + 2) * 1440 + 1440;
  const starts: number[] = [lo];
  const offsets: number[] = [luxonOffset(zone, lo)];
  const changes: Array<[number, number, number]> = [];
  for (let t = lo; t < hi; t += 1440) {
    const before = offsets[offsets.length - 1]!; // never empty: it starts with lo's offset
    if (luxonOffset(zone, t + 1440) === before) continue;
    // Binary search the first minute of the new offset inside this day.
    let a = t;
    let b = t + 1440;
    while (b - a > 1) {
      const mid = Math.floor((a + b) / 2);
      if (luxonOffset(zone, mid) === before) a = mid;
      else b = mid;
    }
    const after = luxonOffset(zone, b);
    starts.push(b);
    offsets.push(after);
    changes.push([b, before, after]);
  }
  const offsetAt = (utc: number): number => {
    if (utc < lo || utc >= hi) return luxonOffset(zone, utc);
    // starts[0] is lo <= utc, so the walk stops inside the table.
    let i = starts.length - 1;
    while (starts[i]! > utc) i--;
    return offsets[i]!;
  };
  const toUtc = (local: number, gap: 'reject' | 'shift'): number | null => {
    // Fast path: the first table segment whose offset maps `local` inside it is the earliest
    // instant with that wall time (segments run in time order).
    // starts and offsets have the same length.
    for (let i = 0; i < starts.length; i++) {
      const utc = local - offsets[i]!;
      if (utc >= starts[i]! && (i + 1 === starts.length ? utc < hi : utc < starts[i + 1]!)) return utc;
    }
    const early = offsetAt(local - 1440);
    const late = offsetAt(local + 1440);
    // Try the larger offset first: it gives the earlier instant (first occurrence).
    const [first, second] = early >= late ? [early, late] : [late, early];
    if (offsetAt(local - first) === first) return local - first;
    if (offsetAt(local - second) === second) return local - second;
    return gap === 'reject' ? null : local - early;
  };
  const format = (utc: number): string => formatIso(utc, offsetAt(utc));
  return { zone, offsetAt, toUtc, format, changes };
}

const pad = (n: number): string => (n < 10 ? '0' : '') + n;

// Answers print thousands of times; date prefixes, clock times and offset suffixes repeat, so
// they are kept rather than rebuilt through a Date object each time.
const clockTexts: string[] = Array.from({ length: 1440 }, (_, m) => `T${pad(Math.floor(m / 60))}:${pad(m % 60)}`);
const datePrefixes = new Map<number, string>();
const offsetSuffixes = new Map<number, string>();

/** Formats a UTC minute shown at a given offset. */
export function formatIso(utc: number, offset: number): string {
  const local = utc + offset;
  const day = Math.floor(local / 1440);
  let prefix = datePrefixes.get(day);
  if (prefix === undefined) {
    prefix = new Date(day * 86_400_000).toISOString().slice(0, 10);
    if (datePrefixes.size > 10_000) datePrefixes.clear();
    datePrefixes.set(day, prefix);
  }
  let suffix = offsetSuffixes.get(offset);
  if (suffix === undefined) {
    const abs = Math.abs(offset);
    suffix = `${offset < 0 ? '-' : '+'}${pad(Math.floor(abs / 60))}:${pad(abs % 60)}`;
    offsetSuffixes.set(offset, suffix);
  }
  return prefix + clockTexts[local - day * 1440] + suffix;
}
