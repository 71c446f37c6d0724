/**
 * Feasible starts of one sitting for one stylist on one local day: the free sets of each step
 * (hands, chair, basin, client cap, hours) cut to the day, then the backward pass per chair.
 */
import { clip, firstEndingAfter, intersect, type Span } from './intervals';
import type { CompiledRequest, SittingPlanSpec } from './compile-request';
import type { EngineIndex, StylistIndex, UnitIndex } from './resource-index';
import { backwardPass, intersectLattices, mergeLattices, type ChainStep, type Grid, type Lattice } from './sitting-pass';

/** Free sets of one stylist on one day, before a chair is chosen. */
export interface DayFrame {
  day: number;
  lo: number;
  hi: number;
  /** Where a sitting may lie: on the clock, salon open, under the client cap, after `earliest`. */
  base: Span;
  /** base with the stylist's hands free. */
  hands: Span;
}

export function dayFrame(idx: EngineIndex, st: StylistIndex, dayOffset: number, earliest: number): DayFrame {
  // Day offsets run over the horizon's days, and dayStarts holds one more entry than there are days.
  const dayStart = idx.ctx.dayStarts[dayOffset]!;
  const lo = Math.max(dayStart, earliest);
  const hi = idx.ctx.dayStarts[dayOffset + 1]!;
  const base = lo < hi ? intersect(clip(st.avail, lo, hi), clip(st.capFree, lo, hi)) : [];
  return { day: dayOffset, lo, hi, base, hands: base.length ? intersect(base, clip(st.handsFree, lo, hi)) : [] };
}

/** Chair and basin free sets for the whole local day (not cut by `earliest`), memoised per index. */
function dayUnits(idx: EngineIndex, dayOffset: number): { chairs: Span[]; basins: Span[] } {
  let units = idx.dayUnits.get(dayOffset);
  if (!units) {
    const lo = idx.ctx.dayStarts[dayOffset]!;
    const hi = idx.ctx.dayStarts[dayOffset + 1]!;
    units = { chairs: idx.chairs.map((c) => clip(c.free, lo, hi)), basins: idx.basins.map((b) => clip(b.free, lo, hi)) };
    idx.dayUnits.set(dayOffset, units);
  }
  return units;
}

/** The chain of steps with each step's free sets; `chairFree` (cut to the day) null drops the chair. */
export function chainSteps(idx: EngineIndex, frame: DayFrame, spec: SittingPlanSpec, chairFree: Span | null): ChainStep[] {
  const base = chairFree ? intersect(frame.base, chairFree) : frame.base;
  const hands = chairFree ? intersect(frame.hands, chairFree) : frame.hands;
  let basins: Span[] | null = null;
  return spec.steps.map((step): ChainStep => {
    if (step.kind === 'developing') return { free: [base], lo: step.lo, hi: step.hi };
    if (step.kind === 'hands_on') return { free: [hands], lo: step.lo, hi: step.hi };
    basins ??= dayUnits(idx, frame.day).basins.map((free) => intersect(hands, free));
    return { free: basins, lo: step.lo, hi: step.hi };
  });
}

export function gridOf(idx: EngineIndex): Grid {
  return { g: idx.ctx.granularity, phase: idx.ctx.phase };
}

/** Shortest possible sitting: used to skip chairs with no long-enough free stretch. */
export function minimumLength(spec: SittingPlanSpec): number {
  return spec.steps.reduce((sum, s) => sum + s.lo, 0);
}

function hasStretch(span: Span, length: number): boolean {
  for (let i = 0; i < span.length; i += 2) if (span[i + 1]! - span[i]! >= length) return true;
  return false;
}

/** One chair's backward pass: kept so the plan for a chosen start reuses it. */
export interface ChairPass {
  chair: UnitIndex;
  steps: ChainStep[];
  /** sets[k] = feasible starts of step k (the output of backwardPass). */
  sets: Lattice[];
}

export interface DayStarts {
  frame: DayFrame;
  /** Feasible starts of the sitting on this day (union over chairs). */
  starts: Lattice;
  passes: ChairPass[];
}

/** Whether some range of a lattice reaches into [lo, hi): a quick test before a day's passes. */
function allowsBetween(l: Lattice, lo: number, hi: number): boolean {
  const i = firstEndingAfter(l, lo - 1);
  return i < l.length && l[i]! < hi;
}

/**
 * Feasible starts of the sitting on this day, with the per-chair passes behind them.
 * The chair-less prefilter is a superset, so an empty prefilter proves the day infeasible.
 * Allowed starts cut the result: the search then runs on to later days instead of stopping at
 * starts a caller would have to throw away.
 */
export function sittingStarts(idx: EngineIndex, st: StylistIndex, dayOffset: number, req: CompiledRequest, sitting: number): DayStarts {
  const spec = req.sittings[sitting]!;
  const frame = dayFrame(idx, st, dayOffset, req.earliest);
  const none: DayStarts = { frame, starts: [], passes: [] };
  if (spec.allowed && !allowsBetween(spec.allowed, frame.lo, frame.hi)) return none;
  const length = minimumLength(spec);
  if (!hasStretch(frame.base, length)) return none;
  const grid = gridOf(idx);
  // backwardPass returns one set per step, and a sitting has at least one step.
  if (backwardPass(chainSteps(idx, frame, spec, null), grid)[0]!.length === 0) return none;
  const passes: ChairPass[] = [];
  const chairsFree = dayUnits(idx, dayOffset).chairs;
  idx.chairs.forEach((chair, c) => {
    const chairFree = chairsFree[c]!;
    if (!hasStretch(intersect(frame.base, chairFree), length)) return;
    const steps = chainSteps(idx, frame, spec, chairFree);
    const sets = backwardPass(steps, grid);
    if (sets[0]!.length) passes.push({ chair, steps, sets });
  });
  const starts = mergeLattices(
    passes.map((p) => p.sets[0]!),
    grid.g,
  );
  return { frame, starts: spec.allowed ? intersectLattices(starts, spec.allowed) : starts, passes };
}
