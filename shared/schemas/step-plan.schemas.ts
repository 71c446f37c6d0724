import { z } from 'zod';

/**
 * What a step puts on the hair. Whether a booking needs a skin test follows from these, whatever service it is
 * booked under: oxidative colour (permanent or demi-permanent mixed with developer) and oxidative toner always do.
 */
export const PRODUCT_FAMILIES = [
  'oxidative_colour',
  'toner_oxidative',
  'lightener',
  'colour_remover',
  'direct_dye',
  'toner_direct',
  'bond_care',
  'none',
] as const;
export const ProductFamilySchema = z.enum(PRODUCT_FAMILIES, { error: 'Say what this step puts on the hair (or nothing)' });
export type ProductFamily = z.infer<typeof ProductFamilySchema>;

/**
 * One timed step of a service. `developing` stretches between its min and max; the others are fixed. How long a
 * product may stay on the hair depends on the salon's processing limits, checked apart from this schema
 * (shared/rules/processing-limits.ts), since they are a salon setting.
 */
export const PlannedStepSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('hands_on'), label: z.string().min(1).max(80), product: ProductFamilySchema, minutes: z.number().int().min(5).max(600) }).strict(),
  z.object({ kind: z.literal('basin'), label: z.string().min(1).max(80), product: ProductFamilySchema, minutes: z.number().int().min(5).max(120) }).strict(),
  z
    .object({
      kind: z.literal('developing'),
      label: z.string().min(1).max(80),
      product: ProductFamilySchema,
      minMinutes: z.number().int().min(5).max(240),
      maxMinutes: z.number().int().min(5).max(240),
      /** Processed with heat (a dryer hood or processor): the family's processing limit is halved (shared/rules/processing-limits.ts). */
      heat: z.boolean().optional(),
    })
    .strict()
    .refine((s) => s.minMinutes <= s.maxMinutes, { message: 'The least time must not exceed the most time', path: ['maxMinutes'] }),
]);
export type PlannedStep = z.infer<typeof PlannedStepSchema>;

export const PlannedSittingSchema = z
  .object({
    /** Calendar days after the previous sitting's date (absent on the first sitting). */
    daysAfterPrevious: z
      .object({ min: z.number().int().min(1).max(180), max: z.number().int().min(1).max(180) })
      .strict()
      .optional(),
    steps: z.array(PlannedStepSchema).min(1).max(30),
  })
  .strict();

/** A service's step plan: one or more sittings on different days, each a chain of steps. */
export const StepPlanSchema = z
  .object({ sittings: z.array(PlannedSittingSchema).min(1).max(6) })
  .strict()
  .superRefine((plan, ctx) => {
    plan.sittings.forEach((s, i) => {
      if (i > 0 && !s.daysAfterPrevious) {
        ctx.addIssue({ code: 'custom', path: ['sittings', i, 'daysAfterPrevious'], message: 'Say how many days after the previous sitting' });
      }
      if (s.daysAfterPrevious && s.daysAfterPrevious.min > s.daysAfterPrevious.max) {
        ctx.addIssue({ code: 'custom', path: ['sittings', i, 'daysAfterPrevious', 'max'], message: 'The most days must not be fewer than the least' });
      }
    });
  });
export type StepPlan = z.infer<typeof StepPlanSchema>;

/** Longest chair time of each sitting, in minutes (developing at its max). */
export function sittingMaxMinutes(plan: StepPlan): number[] {
  return plan.sittings.map((s) => s.steps.reduce((t, st) => t + (st.kind === 'developing' ? st.maxMinutes : st.minutes), 0));
}
