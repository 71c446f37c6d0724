import { z } from 'zod';
import { IdSchema } from './common.schemas';

export const SalonSchema = z.object({
  id: IdSchema,
  name: z.string(),
  slug: z.string(),
  timeZone: z.string(),
  currency: z.string(),
  address: z.string(),
  phone: z.string(),
  skinTestLeadHours: z.number().int(),
  skinTestValidityDays: z.number().int(),
  granularityMinutes: z.number().int(),
  cancellationWindowHours: z.number().int(),
});
export type Salon = z.infer<typeof SalonSchema>;
