/**
 * One local day of the book in UTC minutes, with the re-planned stylist's sittings made to follow the actual times:
 * started steps stay where they really are, a running step lasts at least until now, and the steps not started yet
 * follow on at the next grid point (never before now) with their booked lengths.
 */
import { createContext, instant, type CompileContext } from './compile-context';
import { expandHours, expandPeriods } from './compile-calendars';
import type { StepKind } from './compile-request';
import { parseLocalDate } from './local-time';
import { subtract, type Span } from './intervals';
import { ReplanAskSchema, type ReplanAsk } from './replan.schemas';
import { ScenarioError, fromZodError } from './scenario-error';
import type { Booking, Scenario } from './scenario.schemas';
import { ceilGrid, type Grid } from './sitting-pass';

export interface DayStep {
  kind: StepKind;
  start: number;
  end: number;
  state: 'finished' | 'running' | 'planned';
  basin?: string;
  id?: string;
  label?: string;
  /** Booked length, and the developing range a fix may use (lo = hi = booked length: none). */
  booked: number;
  lo: number;
  hi: number;
}

export interface DaySitting {
  id: string;
  stylist: string;
  chair: string;
  steps: DayStep[];
  inProgress: boolean;
  /** Booked times of the steps, for `moved`, the freed minutes and ordering. */
  bookedTimes: number[];
  skill?: string;
  /** The scenario's own booking, for hand-over checks at the booked times. */
  source: Booking;
}

/** The calendars the conflict scan reads, per stylist, chair and basin id. */
export interface DayCalendars {
  ctx: CompileContext;
  grid: Grid;
  salon: Span;
  clock: Map<string, Span>;
  maxClients: Map<string, number>;
  skills: Map<string, Set<string>>;
  stylistOrder: string[];
  chairOrder: string[];
  basinOrder: string[];
  closedChairs: Map<string, Span>;
  closedBasins: Map<string, Span>;
}

export interface ReplanDay {
  cal: DayCalendars;
  ask: ReplanAsk;
  now: number;
  /** Every booking that touches the day or the next, the re-planned stylist's in-progress ones following their actuals. */
  sittings: DaySitting[];
  /** The local day of now, [start, end) in UTC minutes. */
  day: [number, number];
  /** Actual starts and ends per step of each in-progress sitting. */
  actuals: Map<string, Actuals>;
}

export interface Actuals {
  starts: Array<number | undefined>;
  ends: Array<number | undefined>;
}

const nextDate = (date: string): string => new Date(Date.parse(`${date}T00:00:00Z`) + 86_400_000).toISOString().slice(0, 10);

function calendarsOf(s: Scenario): DayCalendars {
  const ctx = createContext(s);
  const ids = (items: Array<{ id: string }>, field: string) => {
    const seen = new Set<string>();
    items.forEach((item, i) => {
      if (seen.has(item.id)) throw new ScenarioError(`${field}[${i}].id`, `duplicate id "${item.id}"`);
      seen.add(item.id);
    });
    return items.map((x) => x.id);
  };
  const salon = expandHours(ctx, s.salonHours, 'salonHours');
  const closed = (units: Scenario['chairs'], field: string) =>
    new Map(units.map((u, i) => [u.id, u.outOfService.length ? expandPeriods(ctx, u.outOfService, `${field}[${i}].outOfService`) : []]));
  return {
    ctx,
    grid: { g: ctx.granularity, phase: ctx.phase },
    salon,
    clock: new Map(
      s.stylists.map((st, i) => [
        st.id,
        subtract(expandHours(ctx, st.hours, `stylists[${i}].hours`), expandPeriods(ctx, st.timeOff, `stylists[${i}].timeOff`)),
      ]),
    ),
    maxClients: new Map(s.stylists.map((st) => [st.id, st.maxClientsAtOnce])),
    skills: new Map(s.stylists.map((st) => [st.id, new Set(st.skills)])),
    stylistOrder: ids(s.stylists, 'stylists'),
    chairOrder: ids(s.chairs, 'chairs'),
    basinOrder: ids(s.basins, 'basins'),
    closedChairs: closed(s.chairs, 'chairs'),
    closedBasins: closed(s.basins, 'basins'),
  };
}

/**
 * The scenario's bookings that touch the local date or the next one (a sitting pushed past midnight meets the next
 * day's first clients). Text comparison: local date-times sort as text.
 */
function bookingsNear(s: Scenario, date: string): Array<{ booking: Booking; index: number }> {
  const from = `${date}T00:00`;
  const to = `${nextDate(nextDate(date))}T00:00`;
  const out: Array<{ booking: Booking; index: number }> = [];
  s.bookings.forEach((booking, index) => {
    if (booking.steps[0]!.start < to && booking.steps[booking.steps.length - 1]!.end > from) out.push({ booking, index });
  });
  return out;
}

function asBooked(cal: DayCalendars, booking: Booking, i: number): DaySitting {
  const known = (set: string[], value: string, field: string, what: string) => {
    if (!set.includes(value)) throw new ScenarioError(field, `no ${what} with id "${value}"`);
  };
  known(cal.stylistOrder, booking.stylist, `bookings[${i}].stylist`, 'stylist');
  known(cal.chairOrder, booking.chair, `bookings[${i}].chair`, 'chair');
  const bookedTimes: number[] = [];
  const steps = booking.steps.map((step, k): DayStep => {
    const start = instant(cal.ctx, step.start, `bookings[${i}].steps[${k}].start`, true);
    const end = instant(cal.ctx, step.end, `bookings[${i}].steps[${k}].end`, true);
    if (end <= start) throw new ScenarioError(`bookings[${i}].steps[${k}].end`, 'must be after start');
    if (k > 0 && start < bookedTimes[bookedTimes.length - 1]!) throw new ScenarioError(`bookings[${i}].steps[${k}].start`, 'overlaps the step before it');
    bookedTimes.push(start, end);
    const out: DayStep = { kind: step.kind, start, end, state: 'planned', booked: end - start, lo: end - start, hi: end - start };
    if (step.kind === 'basin') {
      known(cal.basinOrder, step.basin, `bookings[${i}].steps[${k}].basin`, 'basin');
      out.basin = step.basin;
    }
    return out;
  });
  return { id: booking.id, stylist: booking.stylist, chair: booking.chair, steps, inProgress: false, bookedTimes, source: booking };
}

/**
 * The sitting's steps from the actuals: finished and running steps where they really are, the rest chained on
 * from the grid point after the previous end (and not before now). `lengths` overrides steps' lengths (a fix).
 */
export function chainSteps(sitting: DaySitting, now: number, grid: Grid, actual: Actuals, lengths?: Map<number, number>): DayStep[] {
  let t = -Infinity;
  const nowOnGrid = ceilGrid(now, grid);
  return sitting.steps.map((step, k) => {
    const length = lengths?.get(k) ?? step.booked;
    const a = actual.starts[k];
    const e = actual.ends[k];
    let out: DayStep;
    if (a !== undefined && e !== undefined) out = { ...step, start: a, end: e, state: 'finished' };
    else if (a !== undefined) out = { ...step, start: a, end: Math.max(ceilGrid(a + length, grid), nowOnGrid), state: 'running' };
    else {
      const start = ceilGrid(Math.max(t, now), grid);
      out = { ...step, start, end: start + length, state: 'planned' };
    }
    t = out.end;
    return out;
  });
}

/** Parses the ask, reads the day's book and re-plans the stylist's in-progress sittings. */
export function readDay(s: Scenario, askInput: unknown): ReplanDay {
  const parsed = ReplanAskSchema.safeParse(askInput);
  if (!parsed.success) {
    const e = fromZodError(parsed.error);
    throw new ScenarioError(`ask.${e.field}`, e.message.slice(e.field.length + 2));
  }
  const ask = parsed.data;
  const cal = calendarsOf(s);
  if (!cal.stylistOrder.includes(ask.stylist)) throw new ScenarioError('ask.stylist', `no stylist with id "${ask.stylist}"`);
  const now = instant(cal.ctx, ask.now, 'ask.now');
  const date = parseLocalDate(ask.now.slice(0, 10))!;
  if (date < cal.ctx.fromDay || date >= cal.ctx.toDay) throw new ScenarioError('ask.now', 'is not inside the horizon');
  const day: [number, number] = [cal.ctx.dayStarts[date - cal.ctx.fromDay]!, cal.ctx.dayStarts[date - cal.ctx.fromDay + 1]!];
  const found = bookingsNear(s, ask.now.slice(0, 10));
  const sittings = found.map(({ booking, index }) => asBooked(cal, booking, index));
  const byId = new Map(sittings.map((x) => [x.id, x]));
  const actuals = new Map<string, Actuals>();
  const given = new Set<string>();

  ask.sittings.forEach((entry, i) => {
    const at = `ask.sittings[${i}]`;
    const sitting = byId.get(entry.booking);
    if (!sitting || sitting.bookedTimes[0]! >= day[1] || sitting.bookedTimes[sitting.bookedTimes.length - 1]! <= day[0]) {
      throw new ScenarioError(`${at}.booking`, `no booking "${entry.booking}" on ${ask.now.slice(0, 10)}`);
    }
    if (given.has(entry.booking)) throw new ScenarioError(`${at}.booking`, `"${entry.booking}" is given twice`);
    given.add(entry.booking);
    if (entry.skill !== undefined) sitting.skill = entry.skill;
    const starts: Array<number | undefined> = sitting.steps.map(() => undefined);
    const ends: Array<number | undefined> = sitting.steps.map(() => undefined);
    const seen = new Set<number>();
    entry.steps.forEach((x, j) => {
      const f = `${at}.steps[${j}]`;
      if (x.step >= sitting.steps.length) throw new ScenarioError(`${f}.step`, `booking "${entry.booking}" has ${sitting.steps.length} steps`);
      if (seen.has(x.step)) throw new ScenarioError(`${f}.step`, `step ${x.step} is given twice`);
      seen.add(x.step);
      const step = sitting.steps[x.step]!;
      if (x.id !== undefined) step.id = x.id;
      if (x.label !== undefined) step.label = x.label;
      if (x.minMinutes !== undefined || x.maxMinutes !== undefined) {
        if (step.kind !== 'developing') throw new ScenarioError(`${f}.minMinutes`, 'only a developing step has a range');
        step.lo = x.minMinutes ?? step.booked;
        step.hi = x.maxMinutes ?? step.booked;
        if (step.lo > step.hi) throw new ScenarioError(`${f}.minMinutes`, 'is greater than maxMinutes');
      }
      if (x.actualEnd !== undefined && x.actualStart === undefined) throw new ScenarioError(`${f}.actualEnd`, 'needs actualStart');
      if (x.actualStart !== undefined) {
        if (sitting.stylist !== ask.stylist) throw new ScenarioError(`${f}.actualStart`, `booking "${entry.booking}" is not ${ask.stylist}'s`);
        starts[x.step] = instant(cal.ctx, x.actualStart, `${f}.actualStart`);
        if (starts[x.step]! > now) throw new ScenarioError(`${f}.actualStart`, 'is after now');
      }
      if (x.actualEnd !== undefined) {
        ends[x.step] = instant(cal.ctx, x.actualEnd, `${f}.actualEnd`);
        if (ends[x.step]! > now) throw new ScenarioError(`${f}.actualEnd`, 'is after now');
        if (ends[x.step]! < starts[x.step]!) throw new ScenarioError(`${f}.actualEnd`, 'is before actualStart');
      }
    });
    // Started steps form a prefix; each one before the last has finished, and no step starts before the one before it ends.
    const started = starts.filter((x) => x !== undefined).length;
    for (let k = 0; k < started; k++) {
      const f = `${at}.steps`;
      if (starts[k] === undefined) throw new ScenarioError(f, `step ${k} has no actualStart but a later step has`);
      if (k < started - 1 && ends[k] === undefined) throw new ScenarioError(f, `step ${k} has no actualEnd but step ${k + 1} has started`);
      if (k > 0 && starts[k]! < ends[k - 1]!) throw new ScenarioError(f, `step ${k} starts before step ${k - 1} ends`);
    }
    if (started === 0) return;
    actuals.set(sitting.id, { starts, ends });
    sitting.inProgress = true;
    sitting.steps = chainSteps(sitting, now, cal.grid, { starts, ends });
  });
  return { cal, ask, now, sittings, day, actuals };
}
