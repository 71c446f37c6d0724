/**
 * The validated frame every compile step shares: zone converter, horizon and grid, plus helpers
 * that turn local text into UTC minutes or throw a ScenarioError naming the field.
 */
import { isKnownZone, parseClock, parseLocalDate, parseLocalDateTime, zoneClock, type ZoneClock } from './local-time';
import { ScenarioError } from './scenario-error';
import type { Scenario } from './scenario.schemas';

/** Longest horizon a scenario may ask for, in days. */
export const MAX_HORIZON_DAYS = 120;

export interface CompileContext {
  clock: ZoneClock;
  granularity: number;
  /** UTC minutes t with t ≡ phase (mod granularity) are on the local-clock grid. */
  phase: number;
  fromDay: number;
  toDay: number;
  /** dayStarts[i] = UTC minute at which local day fromDay + i begins; length = days + 1. */
  dayStarts: number[];
  start: number;
  end: number;
}

export const mod = (a: number, m: number): number => ((a % m) + m) % m;

export function createContext(s: Scenario): CompileContext {
  if (!isKnownZone(s.timeZone)) throw new ScenarioError('timeZone', `unknown IANA time zone "${s.timeZone}"`);
  const g = s.granularityMinutes;
  if (60 % g !== 0) throw new ScenarioError('granularityMinutes', `${g} is not a divisor of 60`);
  const fromDay = parseLocalDate(s.horizon.from);
  if (fromDay === null) throw new ScenarioError('horizon.from', `"${s.horizon.from}" is not a calendar date`);
  const toDay = parseLocalDate(s.horizon.to);
  if (toDay === null) throw new ScenarioError('horizon.to', `"${s.horizon.to}" is not a calendar date`);
  if (toDay <= fromDay) throw new ScenarioError('horizon.to', 'must be after horizon.from');
  if (toDay - fromDay > MAX_HORIZON_DAYS) {
    throw new ScenarioError('horizon', `spans ${toDay - fromDay} days; at most ${MAX_HORIZON_DAYS} allowed`);
  }
  const clock = zoneClock(s.timeZone, fromDay, toDay);
  const dayStarts: number[] = [];
  for (let d = fromDay; d <= toDay; d++) dayStarts.push(clock.toUtc(d * 1440, 'shift') as number);
  // toDay > fromDay, so there are at least two day starts.
  const start = dayStarts[0]!;
  const end = dayStarts[dayStarts.length - 1]!;
  for (const [at, before, after] of clock.changes) {
    // One grid phase per horizon keeps the interval sweep simple; only a few zones shift by 30 min.
    if (at >= start && at < end && mod(after - before, g) !== 0) {
      throw new ScenarioError('granularityMinutes', `${s.timeZone} shifts its clock by ${after - before} minutes in the horizon, not a multiple of ${g}`);
    }
  }
  const phase = mod(-clock.offsetAt(start), g);
  return { clock, granularity: g, phase, fromDay, toDay, dayStarts, start, end };
}

/**
 * An explicit local date-time → UTC minute, or the reason it is not acceptable (a string).
 * Returning the reason lets hot loops name the field only when there is an error.
 */
export function tryInstant(ctx: CompileContext, text: string, onGrid: boolean): number | string {
  const local = parseLocalDateTime(text);
  if (local === null) return `"${text}" is not a valid local date-time`;
  if (onGrid && local % ctx.granularity !== 0) return `${text} is not on the ${ctx.granularity}-minute grid`;
  const utc = ctx.clock.toUtc(local, 'reject');
  return utc ?? `${text} does not exist in ${ctx.clock.zone} (clocks spring forward)`;
}

/** tryInstant that throws a ScenarioError naming the field; rejects spring-forward gap times. */
export function instant(ctx: CompileContext, text: string, field: string, onGrid = false): number {
  const utc = tryInstant(ctx, text, onGrid);
  if (typeof utc === 'string') throw new ScenarioError(field, utc);
  return utc;
}

/** "HH:mm" → minutes after midnight, on the grid. */
export function clockMinutes(ctx: CompileContext, text: string, field: string): number {
  const value = parseClock(text);
  if (value === null) throw new ScenarioError(field, `"${text}" is not a valid time of day`);
  if (value % ctx.granularity !== 0) throw new ScenarioError(field, `${text} is not on the ${ctx.granularity}-minute grid`);
  return value;
}

/** Minutes that must be a positive multiple of the grid. */
export function gridMinutes(ctx: CompileContext, value: number, field: string): number {
  if (value % ctx.granularity !== 0) {
    throw new ScenarioError(field, `${value} is not a multiple of granularityMinutes (${ctx.granularity})`);
  }
  return value;
}
