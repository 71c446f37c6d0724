import { z } from 'zod';
import type { BookingOptionsRequest } from '@shared/schemas/booking.schemas';
import { IdSchema, LocalDateSchema } from '@shared/schemas/common.schemas';
import { StepPlanSchema } from '@shared/schemas/step-plan.schemas';

/** The desk's "Book a service" form: the options request, with "" meaning "any stylist with the skill". */
export const BookFormSchema = z.object({
  clientId: z
    .string()
    .pipe(IdSchema.or(z.literal('')))
    .refine(Boolean, 'Pick a client or add a new one'),
  serviceId: z.string().refine(Boolean, 'Pick a service'),
  stylistId: z.string(),
  earliestDate: LocalDateSchema,
  stepPlan: StepPlanSchema,
});
export type BookFormInput = z.input<typeof BookFormSchema>;
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
