/**
 * Options: the K earliest feasible (stylist, first-sitting start) pairs.
 *
 * Days are swept in order; a day's pairs all come before the next day's, so the sweep stops as
 * soon as K pairs are in hand. Later sittings only depend on their local date (sittings never
 * share a day, so they never compete for the same minutes): a memo of "this sitting and all that
 * follow are feasible from this date" chains them backwards, looking ahead only as many days as
 * daysAfterPrevious allows.
 */
import type { CompiledRequest } from './compile-request';
import { choosePlan, type ChosenSitting } from './plan-choice';
import type { EngineIndex } from './resource-index';
import { sittingStarts, type DayStarts } from './sitting-day';
import type { Lattice } from './sitting-pass';

export interface ChosenOption {
  stylist: string;
  sittings: ChosenSitting[];
}

interface Pair {
  stylist: number;
  day: number;
  start: number;
}

function createSearch(idx: EngineIndex, req: CompiledRequest) {
  const days = idx.ctx.dayStarts.length - 1;
  const memo = new Map<string, DayStarts>();
  const chained = new Map<string, boolean>();
  const dayOf = (si: number, k: number, day: number): DayStarts => {
    const key = `${si}:${k}:${day}`;
    let found = memo.get(key);
    if (!found) {
      // si comes from candidateStylists (indices into idx.stylists) and k from req.sittings.
      found = sittingStarts(idx, idx.stylists[si]!, day, req, k);
      memo.set(key, found);
    }
    return found;
  };
  const startsOf = (si: number, k: number, day: number): Lattice => dayOf(si, k, day).starts;
  /** Earliest day, within sitting k's range after `day`, from which sittings k.. all fit; or -1. */
  const nextDay = (si: number, k: number, day: number): number => {
    const spec = req.sittings[k]!;
    for (let d = day + spec.minDays; d <= day + spec.maxDays && d < days; d++) {
      if (chainFrom(si, k, d)) return d;
    }
    return -1;
  };
  const chainFrom = (si: number, k: number, day: number): boolean => {
    const key = `${si}:${k}:${day}`;
    let ok = chained.get(key);
    if (ok === undefined) {
      ok = startsOf(si, k, day).length > 0 && (k + 1 === req.sittings.length || nextDay(si, k + 1, day) >= 0);
      chained.set(key, ok);
    }
    return ok;
  };
  return { days, dayOf, startsOf, chainFrom, nextDay };
}

function candidateStylists(idx: EngineIndex, req: CompiledRequest): number[] {
  return idx.stylists
    .map((st, i) => ({ st, i }))
    .filter(({ st }) => st.skills.has(req.skill) && (req.stylist === null || st.id === req.stylist))
    .sort((a, b) => (a.st.id < b.st.id ? -1 : a.st.id > b.st.id ? 1 : 0))
    .map(({ i }) => i);
}

/** Up to `count` grid points of a lattice, in order. */
function firstPoints(l: Lattice, count: number, g: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < l.length && out.length < count; i += 2) {
    for (let t = l[i]!; t <= l[i + 1]! && out.length < count; t += g) out.push(t);
  }
  return out;
}

export function findOptions(idx: EngineIndex, req: CompiledRequest): ChosenOption[] {
  const search = createSearch(idx, req);
  const stylists = candidateStylists(idx, req);
  const g = idx.ctx.granularity;
  const pairs: Pair[] = [];
  for (let day = 0; day < search.days && pairs.length < req.limit; day++) {
    const today: Pair[] = [];
    const room = req.limit - pairs.length;
    for (const si of stylists) {
      if (!search.chainFrom(si, 0, day)) continue;
      const points = firstPoints(search.startsOf(si, 0, day), req.spread === 'day' ? 1 : room, g);
      for (const start of points) today.push({ stylist: si, day, start });
    }
    // Stylists are visited in id order and the sort is stable, so ties on start keep id order.
    today.sort((a, b) => a.start - b.start);
    pairs.push(...today.slice(0, room));
  }
  return pairs.map((pair) => planFor(idx, req, search, pair));
}

function planFor(idx: EngineIndex, req: CompiledRequest, search: ReturnType<typeof createSearch>, pair: Pair): ChosenOption {
  const st = idx.stylists[pair.stylist]!;
  const sittings: ChosenSitting[] = [];
  let day = pair.day;
  let start = pair.start;
  for (const [k, spec] of req.sittings.entries()) {
    if (k > 0) {
      // Later sittings: the earliest date that keeps the rest of the chain feasible, earliest start.
      // chainFrom held for the pair, so that date exists and has a start.
      day = search.nextDay(pair.stylist, k, day);
      start = search.startsOf(pair.stylist, k, day)[0]!;
    }
    sittings.push(choosePlan(idx, st, search.dayOf(pair.stylist, k, day).passes, spec, start));
  }
  return { stylist: st.id, sittings };
}
