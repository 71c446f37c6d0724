/**
 * Local ↔ UTC for the tests, written directly on luxon and separately from the engine's table.
 * Ambiguous local times take the first occurrence (RFC 5545 §3.3.5); a nonexistent time moves
 * forward by the gap (luxon's own behaviour, which equals RFC 5545's "offset before the gap").
 */
import { DateTime } from 'luxon';

export interface LocalParts {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
}

export function partsOf(text: string): LocalParts {
  const [date = '', time = '00:00'] = text.split('T');
  const [year, month, day] = date.split('-').map(Number);
  const [hour, minute] = time.split(':').map(Number);
  return { year: year!, month: month!, day: day!, hour: hour!, minute: minute! };
}

const sameWall = (dt: DateTime, p: LocalParts): boolean =>
  dt.year === p.year && dt.month === p.month && dt.day === p.day && dt.hour === p.hour && dt.minute === p.minute;

const memo = new Map<string, { utc: number; exists: boolean }>();

/** UTC minute of a wall-clock time, plus whether that wall-clock time exists at all (memoised). */
export function wallToUtc(p: LocalParts, zone: string): { utc: number; exists: boolean } {
  const key = `${zone} ${p.year}-${p.month}-${p.day} ${p.hour}:${p.minute}`;
  let found = memo.get(key);
  if (!found) {
    found = computeWallToUtc(p, zone);
    memo.set(key, found);
  }
  return found;
}

function computeWallToUtc(p: LocalParts, zone: string): { utc: number; exists: boolean } {
  // "24:00" means the next day's midnight.
  const base = p.hour === 24 ? DateTime.fromObject({ ...p, hour: 0 }, { zone }).plus({ days: 1 }) : null;
  const dt = base ?? DateTime.fromObject(p, { zone });
  const wall = base ? { year: dt.year, month: dt.month, day: dt.day, hour: 0, minute: 0 } : p;
  const later = dt.toMillis() / 60_000;
  let utc = later;
  // luxon picks the later offset for an overlap; look for an earlier instant with the same wall time.
  for (const back of [120, 60, 30]) {
    if (sameWall(DateTime.fromMillis((later - back) * 60_000, { zone }), wall)) {
      utc = later - back;
      break;
    }
  }
  return { utc, exists: sameWall(DateTime.fromMillis(utc * 60_000, { zone }), wall) };
}

export function localToUtc(text: string, zone: string): number {
  return wallToUtc(partsOf(text), zone).utc;
}

/** Local wall-clock fields of a UTC minute. */
export function utcToLocal(utc: number, zone: string): DateTime {
  return DateTime.fromMillis(utc * 60_000, { zone });
}

/** Days since 1970-01-01 of a local calendar date (the floating count). */
export function localDayOf(utc: number, zone: string): number {
  const dt = utcToLocal(utc, zone);
  return Date.UTC(dt.year, dt.month - 1, dt.day) / 86_400_000;
}

/** UTC minute of an ISO 8601 string with offset, as printed in answers. */
export function isoToUtc(iso: string): number {
  const dt = DateTime.fromISO(iso, { setZone: true });
  if (!dt.isValid) throw new Error(`bad ISO time ${iso}`);
  return dt.toMillis() / 60_000;
}

export function dayToDate(day: number): string {
  return new Date(day * 86_400_000).toISOString().slice(0, 10);
}
