/**
 * The strand test gates lightening: after a failed strand test a quote plans no lightener and no colour remover,
 * unless the stylist writes down why (stored with the quote). Pure; the server and the quote editor ask the same.
 */
import type { z } from 'zod';
import type { StrandOutcome } from '../schemas/consultation.schemas';
import type { ProductFamily, StepPlan } from '../schemas/step-plan.schemas';

/** Families that lift or strip colour: what a failed strand test stops. */
export const GATED_FAMILIES: readonly ProductFamily[] = ['lightener', 'colour_remover'];

/** A written reason, not a mark: at least this many characters. */
export const STRAND_OVERRIDE_MIN = 10;

const care: Record<StrandOutcome, number> = { none: 0, passed: 1, fragile: 2, failed: 3 };

/**
 * The strand test a quote goes by: the consultation's answer or the client's latest recorded test, whichever
 * asks for more care. A later passing test clears an earlier failure only when it is recorded on the client card.
 */
export function strandOutcome(answer: StrandOutcome, latestRecorded: Exclude<StrandOutcome, 'none'> | null): StrandOutcome {
  if (!latestRecorded) return answer;
  return care[latestRecorded] > care[answer] ? latestRecorded : answer;
}

/** The plan's lightener and remover steps, as "sitting n, step k “label”". */
export function gatedSteps(plan: StepPlan): string[] {
  return plan.sittings.flatMap((s, i) =>
    s.steps.flatMap((st, k) => (GATED_FAMILIES.includes(st.product) ? [`sitting ${i + 1}, step ${k + 1} “${st.label}”`] : [])),
  );
}

/** Why a quote may not be saved as it is, or null: lightener or remover after a failed strand test needs a written reason. */
export function strandOverrideProblem(plan: StepPlan, outcome: StrandOutcome, reason: string): string | null {
  if (outcome !== 'failed') return null;
  const steps = gatedSteps(plan);
  if (steps.length === 0 || reason.trim().length >= STRAND_OVERRIDE_MIN) return null;
  return (
    `The strand test failed, and this quote plans lightener or colour remover (${steps.slice(0, 3).join('; ')}${steps.length > 3 ? '; …' : ''}). ` +
    `Take those steps out, or write why they are safe to do (at least ${STRAND_OVERRIDE_MIN} characters).`
  );
}

/** For the quote editor: the same check at the reason field. */
export function withStrandGate(outcome: StrandOutcome) {
  return (value: { stepPlan: StepPlan; overrideReason: string }, ctx: z.RefinementCtx) => {
    const problem = strandOverrideProblem(value.stepPlan, outcome, value.overrideReason);
    if (problem) ctx.addIssue({ code: 'custom', path: ['overrideReason'], message: problem });
  };
}
