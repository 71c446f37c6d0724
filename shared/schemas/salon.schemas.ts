import { z } from 'zod';
import { IdSchema } from './common.schemas';
import { ProductFamilySchema } from './step-plan.schemas';
import { LiftPerSittingSchema, ProcessingLimitsSchema } from './planning-rules.schemas';

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
  /** Minutes past a sitting's planned start before the desk may mark a no-show. */
  noShowGraceMinutes: z.number().int(),
  /** Hours after a desk booking is made that it is released while its deposit is still unpaid; null: never. */
  unpaidDepositReleaseHours: z.number().int().nullable(),
  /** Minutes a later client may be asked to start late when an earlier sitting overruns (the re-plan's limit). */
  lateStartLimitMinutes: z.number().int(),
  /** Minutes each limited product family may be on the hair here, without heat (plan editors check against them). */
  processingLimits: ProcessingLimitsSchema,
  /** Levels one sitting may lift, by the state of the hair (the quote rules use them). */
  liftPerSitting: LiftPerSittingSchema,
});
export type Salon = z.infer<typeof SalonSchema>;
