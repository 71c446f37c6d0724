import type { z } from 'zod';
import type { PlannedStep, ProductFamily, StepPlanSchema } from '@shared/schemas/step-plan.schemas';

/** Any form holding a step plan under `stepPlan` (a booking's, or a service's on the set-up screens). */
export type StepPlanFormInput = { stepPlan: z.input<typeof StepPlanSchema> };

/**
 * A new step of a kind, with the other kind's label, product and length carried over where they make sense.
 * A brand-new step names no product: the form makes the person choose one (even "nothing"), because a colour
 * step left at "nothing" would not ask for a skin test.
 */
export function stepOfKind(kind: PlannedStep['kind'], from?: PlannedStep): PlannedStep {
  const label = from?.label ?? '';
  const product = from?.product ?? (undefined as unknown as ProductFamily);
  const minutes = from ? (from.kind === 'developing' ? from.maxMinutes : from.minutes) : 30;
  if (kind === 'developing') return { kind, label, product, minMinutes: Math.min(minutes, 240), maxMinutes: Math.min(minutes, 240) };
  return { kind, label, product, minutes: kind === 'basin' ? Math.min(minutes, 120) : minutes };
}
