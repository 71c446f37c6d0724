/**
 * The resource index: for every stylist, chair and basin, the sorted interval sets the sweeps
 * read (free hands, free chairs, free basins, client-cap headroom, hours on the clock).
 * Built once per query in O(n log n) over bookings.
 */
import { expandHours, expandPeriods } from './compile-calendars';
import { createContext, tryInstant, type CompileContext } from './compile-context';
import { coverageAtLeast, intersect, normalize, subtract, type Span } from './intervals';
import { ScenarioError } from './scenario-error';
import type { Scenario } from './scenario.schemas';

export interface StylistIndex {
  id: string;
  skills: Set<string>;
  maxClients: number;
  /** On the clock: working hours less time off, inside the horizon. */
  clock: Span;
  /** On the clock and inside salon hours: where a new sitting may lie. */
  avail: Span;
  /** Minutes their hands are taken (hands_on and basin steps of their bookings). */
  hands: Span;
  handsFree: Span;
  /** Minutes at least one of their clients is developing. */
  developing: Span;
  /** Minutes where one more client in a chair stays within maxClientsAtOnce. */
  capFree: Span;
}

export interface UnitIndex {
  id: string;
  busy: Span;
  free: Span;
}

export interface EngineIndex {
  ctx: CompileContext;
  salon: Span;
  stylists: StylistIndex[];
  stylistById: Map<string, number>;
  chairs: UnitIndex[];
  basins: UnitIndex[];
  /** Chair and basin free sets cut to one local day, shared by every stylist that day. */
  dayUnits: Map<number, { chairs: Span[]; basins: Span[] }>;
}

function uniqueIds(items: Array<{ id: string }>, field: string): Map<string, number> {
  const ids = new Map<string, number>();
  items.forEach((item, i) => {
    if (ids.has(item.id)) throw new ScenarioError(`${field}[${i}].id`, `duplicate id "${item.id}"`);
    ids.set(item.id, i);
  });
  return ids;
}

// Top-level rather than a closure per step: closures in this loop cost more than the parsing.
const stepField = (i: number, k: number, part: string): string => `bookings[${i}].steps[${k}].${part}`;

function missing(field: string, what: string, value: string): ScenarioError {
  return new ScenarioError(field, `no ${what} with id "${value}"`);
}

/** Validates the scenario's calendars and bookings and builds the index. */
export function buildIndex(s: Scenario): EngineIndex {
  const ctx = createContext(s);
  const horizon: Span = [ctx.start, ctx.end];
  const salon = expandHours(ctx, s.salonHours, 'salonHours');
  const stylistById = uniqueIds(s.stylists, 'stylists');
  const chairIds = uniqueIds(s.chairs, 'chairs');
  const basinIds = uniqueIds(s.basins, 'basins');

  const n = s.stylists.length;
  const hands: Span[] = Array.from({ length: n }, () => []);
  const developing: Span[] = Array.from({ length: n }, () => []);
  const spans: Span[] = Array.from({ length: n }, () => []);
  const chairBusy: Span[] = s.chairs.map(() => []);
  const basinBusy: Span[] = s.basins.map(() => []);

  // Plain loops, and field names built only on failure: this runs for thousands of steps per query.
  // The per-resource arrays are as long as their lists, and the id maps only hold those lists'
  // indices, so the lookups below are in range (hence the non-null assertions).
  for (let i = 0; i < s.bookings.length; i++) {
    const b = s.bookings[i]!;
    const who = stylistById.get(b.stylist);
    if (who === undefined) throw missing(`bookings[${i}].stylist`, 'stylist', b.stylist);
    const chair = chairIds.get(b.chair);
    if (chair === undefined) throw missing(`bookings[${i}].chair`, 'chair', b.chair);
    let previousEnd = -Infinity;
    let previousText = '';
    let first = 0;
    for (let k = 0; k < b.steps.length; k++) {
      const step = b.steps[k]!;
      // Back-to-back steps repeat the same text; reuse the conversion.
      const start = step.start === previousText ? previousEnd : tryInstant(ctx, step.start, true);
      if (typeof start === 'string') throw new ScenarioError(stepField(i, k, 'start'), start);
      const end = tryInstant(ctx, step.end, true);
      if (typeof end === 'string') throw new ScenarioError(stepField(i, k, 'end'), end);
      if (end <= start) throw new ScenarioError(stepField(i, k, 'end'), 'must be after start');
      if (start < previousEnd) throw new ScenarioError(stepField(i, k, 'start'), 'overlaps the step before it');
      if (k === 0) first = start;
      previousEnd = end;
      previousText = step.end;
      if (step.kind === 'developing') {
        developing[who]!.push(start, end);
        continue;
      }
      hands[who]!.push(start, end);
      if (step.kind === 'basin') {
        const basin = basinIds.get(step.basin);
        if (basin === undefined) throw missing(stepField(i, k, 'basin'), 'basin', step.basin);
        basinBusy[basin]!.push(start, end);
      }
    }
    // The client holds the chair (and counts against the stylist's cap) from first step to last.
    chairBusy[chair]!.push(first, previousEnd);
    spans[who]!.push(first, previousEnd);
  }

  const stylists = s.stylists.map((st, i): StylistIndex => {
    const hours = expandHours(ctx, st.hours, `stylists[${i}].hours`);
    const off = expandPeriods(ctx, st.timeOff, `stylists[${i}].timeOff`);
    const clock = subtract(hours, off);
    const handsSet = normalize(hands[i]!);
    // Complements are built on first use: occupancy needs none of them, windows only some.
    let handsFree: Span | null = null;
    let capFree: Span | null = null;
    return {
      id: st.id,
      skills: new Set(st.skills),
      maxClients: st.maxClientsAtOnce,
      clock,
      avail: intersect(clock, salon),
      hands: handsSet,
      get handsFree() {
        return (handsFree ??= subtract(horizon, handsSet));
      },
      developing: normalize(developing[i]!),
      get capFree() {
        return (capFree ??= subtract(horizon, coverageAtLeast(spans[i]!, st.maxClientsAtOnce)));
      },
    };
  });
  // Out-of-service periods only shrink what is free: occupancy still counts clients, not closures.
  const unit = (id: string, busy: Span, closed: Span): UnitIndex => {
    const merged = normalize(busy);
    let free: Span | null = null;
    return {
      id,
      busy: merged,
      get free() {
        return (free ??= subtract(subtract(horizon, merged), closed));
      },
    };
  };
  const closedOf = (periods: Scenario['chairs'][number]['outOfService'], field: string) => (periods.length === 0 ? [] : expandPeriods(ctx, periods, field));
  return {
    ctx,
    salon,
    stylists,
    stylistById,
    chairs: s.chairs.map((c, i) => unit(c.id, chairBusy[i]!, closedOf(c.outOfService, `chairs[${i}].outOfService`))),
    basins: s.basins.map((b, i) => unit(b.id, basinBusy[i]!, closedOf(b.outOfService, `basins[${i}].outOfService`))),
    dayUnits: new Map(),
  };
}
