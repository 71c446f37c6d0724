/**
 * Processing limits: how long a product family may stay on the hair, counted from when the first section got
 * product (not from when the application ends), until it is rinsed off at a basin. Pure: no IO.
 *
 * Every value here is common practice (CP), from memory, not from a standard; the product's own instructions
 * and local regulations come first. A salon may set its own limits (Set-up → Salon), never above the hard
 * maxima. docs/quotes.md lists the same values.
 */
import type { z } from 'zod';
import type { PlannedStep, ProductFamily, StepPlan } from '../schemas/step-plan.schemas';

/** The families whose contact time is limited: those that lift, remove or oxidise. */
export const LIMITED_FAMILIES = ['lightener', 'oxidative_colour', 'toner_oxidative', 'colour_remover'] as const satisfies readonly ProductFamily[];
export type LimitedFamily = (typeof LIMITED_FAMILIES)[number];
export type ProcessingLimits = Record<LimitedFamily, number>;

/**
 * The salon's starting limits, minutes on the hair without heat (CP): lightener on the head about 45–50 min at
 * most; permanent colour 30–45; demi-permanent colour and toner 5–30; colour remover 20–60 per application.
 */
export const DEFAULT_PROCESSING_LIMITS: ProcessingLimits = { lightener: 50, oxidative_colour: 45, toner_oxidative: 30, colour_remover: 60 };

/**
 * What no salon may exceed. CP: the longest times commonly printed in product instructions for the family —
 * lightener off the scalp up to about 60 min (it is spent by then and only damages), high-lift permanent colour
 * up to about 60 min, demi-permanent colour for grey blending up to about 40–45 min, colour remover up to 60 min
 * per application (a spent remover is rinsed and applied again, never left longer).
 */
export const HARD_MAX_PROCESSING_MINUTES: ProcessingLimits = { lightener: 60, oxidative_colour: 60, toner_oxidative: 45, colour_remover: 60 };

/** CP: heat (a dryer hood or processor) roughly halves processing time, so it halves the limit and the least time too. */
export const HEAT_FACTOR = 0.5;

export const limitedFamilyNames: Record<LimitedFamily, string> = {
  lightener: 'Lightener',
  oxidative_colour: 'Oxidative colour',
  toner_oxidative: 'Toner with developer',
  colour_remover: 'Colour remover',
};

export function isLimited(family: ProductFamily): family is LimitedFamily {
  return (LIMITED_FAMILIES as readonly string[]).includes(family);
}

/** The most minutes this family may be on the hair in this salon, with or without heat; null when not limited. */
export function limitFor(family: ProductFamily, limits: ProcessingLimits, heat: boolean): number | null {
  if (!isLimited(family)) return null;
  return heat ? Math.floor(limits[family] * HEAT_FACTOR) : limits[family];
}

export type LimitIssue = {
  family: LimitedFamily;
  /** Where the limit is passed: the step at which the product has been on longest, as a form path. */
  path: (string | number)[];
  /** The step in words: sitting 1, step 3 “Lightener lifts”. */
  where: string;
  message: string;
};

const stepMinutes = (s: PlannedStep) => (s.kind === 'developing' ? s.maxMinutes : s.minutes);

/**
 * Every place a plan keeps a limited product on the hair longer than the salon allows. A product goes on at the
 * first step that names it and stays until the next basin step (a rinse); every step in between counts, the
 * developing steps at their most time. So an application followed by its developing step must fit together:
 * application minutes + developing most ≤ the limit. Sections applied one after the other need a rinse between
 * them, or they count as one application.
 */
export function processingLimitIssues(plan: StepPlan, limits: ProcessingLimits): LimitIssue[] {
  const issues: LimitIssue[] = [];
  plan.sittings.forEach((sitting, s) => {
    // Products on the hair since the last rinse: where each went on, minutes so far, heat, already reported.
    let onHair = new Map<LimitedFamily, { from: number; minutes: number; heat: boolean; reported: boolean }>();
    sitting.steps.forEach((step, j) => {
      if (step.kind === 'basin') {
        onHair = new Map();
        return;
      }
      for (const run of onHair.values()) run.minutes += stepMinutes(step);
      if (!isLimited(step.product)) return;
      const run = onHair.get(step.product) ?? { from: j, minutes: stepMinutes(step), heat: false, reported: false };
      onHair.set(step.product, run);
      run.heat ||= step.kind === 'developing' && step.heat === true;
      const limit = limitFor(step.product, limits, run.heat)!;
      if (run.minutes <= limit || run.reported) return;
      run.reported = true;
      const first = sitting.steps[run.from]!; // run.from is an earlier step of this sitting
      const heatNote = run.heat ? ` with heat (the salon's ${limits[step.product]} min halved)` : '';
      const since = run.from === j ? 'on its own' : `counted from step ${run.from + 1} “${first.label}”, when it first goes on`;
      const where = `sitting ${s + 1}, step ${j + 1} “${step.label}”`;
      issues.push({
        family: step.product,
        path: ['stepPlan', 'sittings', s, 'steps', j],
        where,
        message:
          `${where.charAt(0).toUpperCase()}${where.slice(1)}: ${limitedFamilyNames[step.product].toLowerCase()} may be on the hair at most ` +
          `${limit} min${heatNote}; this plan keeps it on up to ${run.minutes} min, ${since}. ` +
          'Shorten the steps, or apply in sections with a rinse between them.',
      });
    });
  });
  return issues;
}

/** For a form or request schema holding `stepPlan`: adds each limit issue at its step. */
export function withinProcessingLimits(limits: ProcessingLimits) {
  return (value: { stepPlan: StepPlan }, ctx: z.RefinementCtx) => {
    for (const issue of processingLimitIssues(value.stepPlan, limits)) ctx.addIssue({ code: 'custom', path: issue.path, message: issue.message });
  };
}
