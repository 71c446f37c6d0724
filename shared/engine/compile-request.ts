/** Checks the request and fits against the grid and turns them into minute ranges. */
import { gridMinutes, instant, type CompileContext } from './compile-context';
import { ScenarioError } from './scenario-error';
import type { Scenario } from './scenario.schemas';

export type StepKind = 'hands_on' | 'developing' | 'basin';

export interface StepRange {
  kind: StepKind;
  /** Shortest and longest real minutes, both multiples of the grid. */
  lo: number;
  hi: number;
}

export interface SittingPlanSpec {
  steps: StepRange[];
  /** Local-date distance from the previous sitting (unused for the first). */
  minDays: number;
  maxDays: number;
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
        };
      }
      const minutes = gridMinutes(ctx, step.minutes, `${f}.minutes`);
      return { kind: step.kind, lo: minutes, hi: minutes };
    });
    return { steps, minDays: gap?.min ?? 0, maxDays: gap?.max ?? 0 };
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

/** Fit minutes must sit on the grid too. */
export function checkFits(ctx: CompileContext, s: Scenario): void {
  s.fits.forEach((fit, i) => gridMinutes(ctx, fit.minutes, `fits[${i}].minutes`));
}
