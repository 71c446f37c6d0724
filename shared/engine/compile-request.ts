/** Checks the request and fits against the grid and turns them into minute ranges. */
import { gridMinutes, instant, type CompileContext } from './compile-context';
import { ScenarioError } from './scenario-error';
import type { Scenario } from './scenario.schemas';
import { ceilGrid, floorGrid, mergeLattices, type Lattice } from './sitting-pass';

export type StepKind = 'hands_on' | 'developing' | 'basin';

export interface StepRange {
  kind: StepKind;
  /** Shortest and longest real minutes, both multiples of the grid. */
  lo: number;
  hi: number;
  /** The request's own id and label for the step, returned with the planned step. */
  id?: string;
  label?: string;
}

export interface SittingPlanSpec {
  steps: StepRange[];
  /** Local-date distance from the previous sitting (unused for the first). */
  minDays: number;
  maxDays: number;
  /** Grid starts the sitting may take (inside the horizon), or null for any. */
  allowed: Lattice | null;
}

export interface CompiledRequest {
  skill: string;
  stylist: string | null;
  earliest: number;
  sittings: SittingPlanSpec[];
  limit: number;
  spread: 'day' | 'none';
}

export function compileRequest(ctx: CompileContext, s: Scenario, stylistIds: Map<string, number>): CompiledRequest {
  const r = s.request;
  if (!r) throw new ScenarioError('request', 'is required for options');
  if (r.stylist !== null && !stylistIds.has(r.stylist)) {
    throw new ScenarioError('request.stylist', `no stylist with id "${r.stylist}"`);
  }
  const sittings = r.sittings.map((sitting, i): SittingPlanSpec => {
    const at = `request.sittings[${i}]`;
    const gap = sitting.daysAfterPrevious;
    if (i === 0 && gap) throw new ScenarioError(`${at}.daysAfterPrevious`, 'the first sitting has no previous sitting');
    if (i > 0 && !gap) throw new ScenarioError(`${at}.daysAfterPrevious`, 'is required after the first sitting');
    if (gap && gap.min > gap.max) throw new ScenarioError(`${at}.daysAfterPrevious.min`, 'is greater than max');
    const steps = sitting.steps.map((step, k): StepRange => {
      const f = `${at}.steps[${k}]`;
      if (step.kind === 'developing') {
        if (step.minMinutes > step.maxMinutes) throw new ScenarioError(`${f}.minMinutes`, 'is greater than maxMinutes');
        return {
          kind: 'developing',
          lo: gridMinutes(ctx, step.minMinutes, `${f}.minMinutes`),
          hi: gridMinutes(ctx, step.maxMinutes, `${f}.maxMinutes`),
          ...tags(step),
        };
      }
      const minutes = gridMinutes(ctx, step.minutes, `${f}.minutes`);
      return { kind: step.kind, lo: minutes, hi: minutes, ...tags(step) };
    });
    const allowed = sitting.allowedStarts ? allowedStarts(ctx, sitting.allowedStarts, `${at}.allowedStarts`) : null;
    return { steps, minDays: gap?.min ?? 0, maxDays: gap?.max ?? 0, allowed };
  });
  return {
    skill: r.skill,
    stylist: r.stylist,
    earliest: instant(ctx, r.earliest, 'request.earliest'),
    sittings,
    limit: r.limit,
    spread: r.spread,
  };
}

/** Only the tags the request gives, so an answer without them reads as before. */
function tags(step: { id?: string; label?: string }): { id?: string; label?: string } {
  return { ...(step.id !== undefined ? { id: step.id } : {}), ...(step.label !== undefined ? { label: step.label } : {}) };
}

/**
 * A sitting's allowed start stretches as grid points inside the horizon: from each `from` rounded up onto the grid to
 * its `to` rounded down (both ends count), merged. A stretch outside the horizon simply allows nothing.
 */
function allowedStarts(ctx: CompileContext, stretches: Array<{ from: string; to: string }>, field: string): Lattice {
  const grid = { g: ctx.granularity, phase: ctx.phase };
  const parts = stretches.map((stretch, j): Lattice => {
    const from = instant(ctx, stretch.from, `${field}[${j}].from`);
    const to = instant(ctx, stretch.to, `${field}[${j}].to`);
    if (to < from) throw new ScenarioError(`${field}[${j}].to`, 'is before from');
    const p = ceilGrid(Math.max(from, ctx.start), grid);
    const q = floorGrid(Math.min(to, ctx.end), grid);
    return p <= q ? [p, q] : [];
  });
  return mergeLattices(parts, ctx.granularity);
}

/** Fit minutes must sit on the grid too. */
export function checkFits(ctx: CompileContext, s: Scenario): void {
  s.fits.forEach((fit, i) => gridMinutes(ctx, fit.minutes, `fits[${i}].minutes`));
}
