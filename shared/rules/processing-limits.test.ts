import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { StepPlanSchema, type PlannedStep, type StepPlan } from '../schemas/step-plan.schemas';
import { limitFor, processingLimitIssues, withinProcessingLimits, type ProcessingLimits } from './processing-limits';

// Limits typed by hand from the trade's rules of thumb (common practice, from memory): lightener on the head about
// 45–50 min at most, permanent colour 30–45 min, demi-permanent colour and toner up to 30, remover up to 60 per application.
const limits: ProcessingLimits = { lightener: 50, oxidative_colour: 45, toner_oxidative: 30, colour_remover: 60 };
const h = (label: string, minutes: number, product: PlannedStep['product'] = 'none'): PlannedStep => ({ kind: 'hands_on', label, product, minutes });
const b = (label: string, minutes: number): PlannedStep => ({ kind: 'basin', label, product: 'none', minutes });
const d = (label: string, min: number, max: number, product: PlannedStep['product'], heat?: boolean): PlannedStep => ({
  kind: 'developing',
  label,
  product,
  minMinutes: min,
  maxMinutes: max,
  ...(heat !== undefined && { heat }),
});
const plan = (...steps: PlannedStep[]): StepPlan => ({ sittings: [{ steps }] });

describe('contact time', () => {
  it('counts the application and the developing most together: 45 + 50 = 95 min of lightener is over 50', () => {
    const issues = processingLimitIssues(plan(h('Apply lightener', 45, 'lightener'), d('Lightener lifts', 30, 50, 'lightener'), b('Rinse', 15)), limits);
    expect(issues).toHaveLength(1);
    expect(issues[0]?.path).toEqual(['stepPlan', 'sittings', 0, 'steps', 1]);
    expect(issues[0]?.family).toBe('lightener');
    expect(issues[0]?.message).toMatch(
      /Sitting 1, step 2 “Lightener lifts”: lightener may be on the hair at most 50 min; this plan keeps it on up to 95 min, counted from step 1 “Apply lightener”/,
    );
  });

  it('accepts 20 + 30 = 50 min exactly, and a developing step alone over the limit is refused', () => {
    expect(processingLimitIssues(plan(h('Apply lightener', 20, 'lightener'), d('Lightener lifts', 20, 30, 'lightener'), b('Rinse', 10)), limits)).toEqual([]);
    const alone = processingLimitIssues(plan(d('Colour develops', 30, 50, 'oxidative_colour')), limits);
    expect(alone[0]?.message).toMatch(/at most 45 min; this plan keeps it on up to 50 min, on its own/);
  });

  it('sections count apart only with a rinse between them', () => {
    const section = (n: number) => [h(`Apply lightener, section ${n}`, 25, 'lightener'), d(`Lifts, section ${n}`, 20, 25, 'lightener')];
    // 25 + 25 = 50 for each section when each is rinsed before the next.
    expect(processingLimitIssues(plan(...section(1), b('Rinse section 1', 10), ...section(2), b('Rinse section 2', 10)), limits)).toEqual([]);
    // Without the rinse the first section is still on: 25 + 25 + 25 = 75 > 50 at the second application.
    const together = processingLimitIssues(plan(...section(1), ...section(2), b('Rinse', 10)), limits);
    expect(together.map((i) => i.path.at(-1))).toEqual([2]);
    expect(together[0]?.message).toMatch(/up to 75 min, counted from step 1/);
  });

  it('halves the limit with heat (common practice: heat roughly halves processing time)', () => {
    expect(limitFor('colour_remover', limits, true)).toBe(30); // 60 × ½
    expect(limitFor('lightener', limits, true)).toBe(25); // 50 × ½
    expect(limitFor('direct_dye', limits, true)).toBeNull();
    const remover = (heat: boolean) => plan(h('Apply remover', 20, 'colour_remover'), d('Remover processes', 10, 15, 'colour_remover', heat), b('Rinse', 20));
    // 20 + 15 = 35 min: within 60 without heat, over 30 with it.
    expect(processingLimitIssues(remover(false), limits)).toEqual([]);
    expect(processingLimitIssues(remover(true), limits)[0]?.message).toMatch(/at most 30 min with heat \(the salon's 60 min halved\)/);
  });

  it('leaves direct dye, bond care and steps without product alone', () => {
    expect(processingLimitIssues(plan(h('Apply vivid', 90, 'direct_dye'), d('Vivid develops', 30, 120, 'direct_dye'), b('Rinse', 15)), limits)).toEqual([]);
  });

  it('puts each issue at its step in a form schema', () => {
    const schema = z.object({ stepPlan: StepPlanSchema }).superRefine(withinProcessingLimits(limits));
    const r = schema.safeParse({
      stepPlan: {
        sittings: [
          { steps: [h('Warm-up', 10)] },
          { daysAfterPrevious: { min: 3, max: 14 }, steps: [h('Apply toner', 20, 'toner_oxidative'), d('Toner develops', 10, 20, 'toner_oxidative')] },
        ],
      },
    });
    expect(r.success).toBe(false);
    // 20 + 20 = 40 > 30 for toner.
    expect(r.error?.issues.map((i) => i.path.join('.'))).toEqual(['stepPlan.sittings.1.steps.1']);
  });
});
