import { z } from 'zod';
import type { BookingOptionsRequest } from '../../../shared/schemas/booking.schemas';
import { IdSchema, LocalDateSchema } from '../../../shared/schemas/common.schemas';
import { StepPlanSchema, type PlannedStep, type ProductFamily } from '../../../shared/schemas/step-plan.schemas';

/** The desk's "Book a service" form: the options request, with "" meaning "any stylist with the skill". */
export const BookFormSchema = z.object({
  clientId: z.string().pipe(IdSchema.or(z.literal(''))).refine(Boolean, 'Pick a client or add a new one'),
  serviceId: z.string().refine(Boolean, 'Pick a service'),
  stylistId: z.string(),
  earliestDate: LocalDateSchema,
  stepPlan: StepPlanSchema,
});
export type BookFormInput = z.input<typeof BookFormSchema>;
/** Any form holding a step plan under `stepPlan` (a booking's, or a service's on the set-up screens). */
export type StepPlanFormInput = { stepPlan: z.input<typeof StepPlanSchema> };
export type BookFormValues = z.output<typeof BookFormSchema>;

export function toOptionsRequest(values: BookFormValues): BookingOptionsRequest {
  return {
    clientId: values.clientId,
    serviceId: values.serviceId,
    stepPlan: values.stepPlan,
    stylistId: values.stylistId || null,
    earliestDate: values.earliestDate,
    limit: 6,
  };
}

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
