import { z } from 'zod';
import { IdSchema } from './common.schemas';
import { StepPlanSchema } from './step-plan.schemas';

export const ServiceCategorySchema = z.enum(['consultation', 'skin_test', 'colour', 'cut', 'treatment']);

export const ServiceSummarySchema = z.object({
  id: IdSchema,
  name: z.string(),
  description: z.string(),
  category: ServiceCategorySchema,
  skill: z.string(),
  priceCents: z.number().int(),
  priceIsFrom: z.boolean(),
  depositCents: z.number().int(),
  onlineBookable: z.boolean(),
  /** Oxidative colour: needs a negative skin test read at least the salon's lead time before. */
  needsSkinTest: z.boolean(),
  stepPlan: StepPlanSchema,
});
export type ServiceSummary = z.infer<typeof ServiceSummarySchema>;
export const ServiceListSchema = z.object({ services: z.array(ServiceSummarySchema) });

export const StylistSummarySchema = z.object({ id: IdSchema, name: z.string(), skills: z.array(z.string()), maxClientsAtOnce: z.number().int() });
export const StylistListSchema = z.object({ stylists: z.array(StylistSummarySchema) });
