/**
 * Reading one plan off the feasible-start sets, for a chosen (stylist, start).
 *
 * Several plans can share a start (chair, basin, developing lengths). We pick, lexicographically:
 *  1. fewest separate stretches of hands-busy time in the stylist's day (a new hands_on/basin step
 *     that touches existing hands work, or our own previous hands step, adds no new stretch);
 *  2. most hands_on/basin minutes placed while another client of theirs is developing;
 *  3. the earliest end (shortest sitting: least chair time);
 *  4. the chair whose free stretch around the sitting is shortest (best fit leaves long free
 *     stretches of other chairs whole), then the first chair in input order;
 *  5. per basin step, the basin with the shortest free stretch around it, then input order.
 * Criteria 1–3 are additive over steps, so a small dynamic program over step end times finds the
 * best durations exactly; the sets from the backward pass guarantee every branch completes.
 */
import { clip, findContaining, totalLength, type Span } from './intervals';
import type { SittingPlanSpec, StepKind } from './compile-request';
import type { EngineIndex, StylistIndex, UnitIndex } from './resource-index';
import type { ChairPass } from './sitting-day';
import { latticeHas, type ChainStep, type Lattice } from './sitting-pass';

export interface ChosenStep {
  kind: StepKind;
  start: number;
  end: number;
  basin?: string;
  id?: string;
  label?: string;
}

export interface ChosenSitting {
  chair: string;
  steps: ChosenStep[];
}

interface State {
  frag: number;
  win: number;
  prev: number;
}

const better = (a: State, b: State): boolean => a.frag < b.frag || (a.frag === b.frag && a.win > b.win);

const endsAt = (span: Span, t: number): boolean => findContaining(span, t - 1) >= 0 && findContaining(span, t) < 0;
const startsAt = (span: Span, t: number): boolean => findContaining(span, t) >= 0 && findContaining(span, t - 1) < 0;

/** Furthest end a step starting at u may reach inside one interval of its free sets. */
function reach(step: ChainStep, u: number): number {
  let best = -Infinity;
  for (const span of step.free) {
    const i = findContaining(span, u);
    if (i < 0) continue;
    const end = span[i + 1]!;
    if (end > best) best = end;
  }
  return best;
}

/**
 * Best step end times for one chair, or null when t is not a feasible start with it.
 * `steps` and `sets` hold one entry per step of `spec`, so indexing them by step is in range.
 */
function bestEnds(st: StylistIndex, spec: SittingPlanSpec, steps: ChainStep[], sets: Lattice[], t: number, g: number) {
  if (!latticeHas(sets[0]!, t)) return null;
  let layer = new Map<number, State>([[t, { frag: 0, win: 0, prev: -1 }]]);
  const layers: Array<Map<number, State>> = [layer];
  spec.steps.forEach((step, k) => {
    const next = new Map<number, State>();
    const isHands = step.kind !== 'developing';
    const prevHands = k > 0 && spec.steps[k - 1]!.kind !== 'developing';
    for (const [u, state] of layer) {
      const limit = reach(steps[k]!, u);
      for (let e = u + step.lo; e <= u + step.hi && e <= limit; e += g) {
        if (k + 1 < spec.steps.length && !latticeHas(sets[k + 1]!, e)) continue;
        let frag = state.frag;
        let win = state.win;
        if (isHands) {
          frag += 1 - (prevHands || endsAt(st.hands, u) ? 1 : 0) - (startsAt(st.hands, e) ? 1 : 0);
          win += totalLength(clip(st.developing, u, e));
        }
        const candidate = { frag, win, prev: u };
        const old = next.get(e);
        if (!old || better(candidate, old)) next.set(e, candidate);
      }
    }
    layer = next;
    layers.push(layer);
  });
  let end = -1;
  let best: State | null = null;
  for (const [e, state] of layer) {
    if (!best || better(state, best) || (!better(best, state) && e < end)) {
      best = state;
      end = e;
    }
  }
  if (!best) return null;
  const ends: number[] = [end];
  // layers holds one map per step plus the start, and each end was reached from the layer before.
  for (let k = spec.steps.length; k > 1; k--) ends.unshift((layers[k]!.get(ends[0]!) as State).prev);
  return { score: best, ends };
}

/** Length of the unit's free stretch holding `start` (callers pass a start inside one). */
function fitLength(unit: UnitIndex, start: number): number {
  const i = findContaining(unit.free, start);
  return unit.free[i + 1]! - unit.free[i]!;
}

function pickBasin(idx: EngineIndex, start: number, end: number): string {
  let chosen: UnitIndex | null = null;
  for (const basin of idx.basins) {
    const i = findContaining(basin.free, start);
    if (i < 0 || basin.free[i + 1]! < end) continue;
    if (!chosen || fitLength(basin, start) < fitLength(chosen, start)) chosen = basin;
  }
  return (chosen as UnitIndex).id;
}

/** The chosen plan for a sitting starting at t, from the day's per-chair passes (chair order). */
export function choosePlan(idx: EngineIndex, st: StylistIndex, passes: ChairPass[], spec: SittingPlanSpec, t: number): ChosenSitting {
  const g = idx.ctx.granularity;
  let pick: { chair: UnitIndex; score: State; ends: number[] } | null = null;
  for (const { chair, steps, sets } of passes) {
    const found = bestEnds(st, spec, steps, sets, t, g);
    if (!found) continue;
    // ends holds one end per step, and a sitting has at least one step.
    const end = found.ends[found.ends.length - 1]!;
    const pickEnd = pick ? pick.ends[pick.ends.length - 1]! : Infinity;
    const sameScore = pick && !better(found.score, pick.score) && !better(pick.score, found.score);
    if (!pick || better(found.score, pick.score) || (sameScore && (end < pickEnd || (end === pickEnd && fitLength(chair, t) < fitLength(pick.chair, t))))) {
      pick = { chair, score: found.score, ends: found.ends };
    }
  }
  if (!pick) throw new Error('choosePlan called with an infeasible start');
  let start = t;
  const steps = spec.steps.map((step, k): ChosenStep => {
    const end = pick.ends[k]!;
    const chosen: ChosenStep = { kind: step.kind, start, end };
    if (step.id !== undefined) chosen.id = step.id;
    if (step.label !== undefined) chosen.label = step.label;
    if (step.kind === 'basin') chosen.basin = pickBasin(idx, start, end);
    start = end;
    return chosen;
  });
  return { chair: pick.chair.id, steps };
}
