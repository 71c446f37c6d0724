import { z } from 'zod';
import { IdSchema } from './common.schemas';
import { ProductFamilySchema } from './step-plan.schemas';

export const SalonSchema = z.object({
  id: IdSchema,
  name: z.string(),
  slug: z.string(),
  timeZone: z.string(),
  currency: z.string(),
  /** ISO 3166-1 alpha-2: phone numbers typed without a country code are read as this country's. */
  country: z.string(),
  address: z.string(),
  phone: z.string(),
  skinTestLeadHours: z.number().int(),
  skinTestValidityDays: z.number().int(),
  /** Product families beyond oxidative colour and oxidative toner that need a skin test in this salon. */
  skinTestFamilies: z.array(ProductFamilySchema),
  granularityMinutes: z.number().int(),
  cancellationWindowHours: z.number().int(),
  /** What a cancellation inside the window keeps: the deposit, or nothing. */
  cancellationKeeps: z.enum(['deposit', 'nothing']),
});
export type Salon = z.infer<typeof SalonSchema>;
