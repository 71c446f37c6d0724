import { isSupportedCountry } from 'libphonenumber-js';
import { z } from 'zod';
import { isKnownZone } from '../engine/local-time';
import { ClockTimeSchema, HoursListSchema } from './hours-rule.schemas';
import { WIDENING_FAMILIES } from '../rules/skin-test-need';
import { LiftPerSittingSchema, ProcessingLimitsSchema } from './planning-rules.schemas';

/** A country phone numbers can be read for: ISO 3166-1 alpha-2, as libphonenumber-js knows them. */
export const PhoneCountrySchema = z
  .string()
  .trim()
  .toUpperCase()
  .refine((c) => /^[A-Z]{2}$/.test(c) && isSupportedCountry(c), 'Choose a country');

const whole = (min: number, max: number, what: string) =>
  z
    .number({ error: `Enter ${what}` })
    .int(`Enter whole ${what}`)
    .min(min, `At least ${min}`)
    .max(max, `At most ${max}`);

/**
 * Everything about how the salon works that the owner sets: the same schema checks the set-up form
 * and the server.
 */
export const SalonSettingsSchema = z
  .object({
    name: z.string().trim().min(1, 'Enter the salon name').max(120),
    address: z.string().trim().max(300),
    phone: z.string().trim().max(40),
    // IANA time-zone database names, e.g. America/Denver (checked against the zone data luxon reads).
    timeZone: z.string().trim().refine(isKnownZone, 'Use a time-zone name like America/Denver or Europe/Berlin'),
    currency: z
      .string()
      .trim()
      .regex(/^[A-Z]{3}$/, 'Use a three-letter ISO 4217 code like USD or EUR'),
    // Left out: unchanged (older callers of this API do not send it).
    country: PhoneCountrySchema.optional(),
    hours: HoursListSchema,
    // The allergy alert test is read 48 hours after it is applied (Cosmetics Europe Recommendation No 27, 2023):
    // a salon may ask for more, never less.
    skinTestLeadHours: z
      .number({ error: 'Enter hours' })
      .int('Enter whole hours')
      .min(48, 'At least 48 hours: the test is read 48 hours after it is applied')
      .max(720, 'At most 720'),
    skinTestValidityDays: whole(1, 3650, 'days'),
    // Families beyond oxidative colour and oxidative toner that also need a skin test here. Left out: unchanged.
    skinTestFamilies: z
      .array(z.enum(WIDENING_FAMILIES))
      .max(WIDENING_FAMILIES.length)
      .refine((l) => new Set(l).size === l.length, 'Each family once')
      .optional(),
    holdMinutes: whole(1, 120, 'minutes'),
    cancellationWindowHours: whole(0, 720, 'hours'),
    cancellationKeeps: z.enum(['deposit', 'nothing']),
    // Minutes past a sitting's planned start before a no-show may be marked. Left out: unchanged.
    noShowGraceMinutes: whole(0, 240, 'minutes').optional(),
    // Release a desk booking whose deposit is still unpaid this many hours after it was made; null: never. Left out: unchanged.
    unpaidDepositReleaseHours: whole(1, 720, 'hours').nullable().optional(),
    // Minutes a later client may be asked to start late when an earlier sitting overruns. Left out: unchanged.
    lateStartLimitMinutes: whole(0, 240, 'minutes').optional(),
    quietFrom: ClockTimeSchema,
    quietTo: ClockTimeSchema,
    reminderOffsetsHours: z
      .array(whole(1, 336, 'hours'))
      .max(4, 'At most four reminders')
      .refine((list) => new Set(list).size === list.length, 'Each reminder needs its own time'),
    // EU Regulation 1223/2009 Annex III entry 12: hydrogen peroxide in hair products at most 12 %.
    maxDeveloperPercent: z.number({ error: 'Enter a percentage' }).gt(0, 'More than 0').max(12, 'At most 12 % (EU Regulation 1223/2009, Annex III)'),
    // Tax at checkout, once per receipt (docs/money.md): the rate in thousandths of a percent (8.25 % is 8250),
    // 0 to 50 %, and whether menu and product prices include it. Left out: unchanged.
    taxRateMilliPercent: z
      .number({ error: 'Enter a rate, e.g. 8.25' })
      .int('At most three decimals')
      .min(0, 'At least 0 %')
      .max(50_000, 'At most 50 %')
      .optional(),
    taxInclusive: z.boolean().optional(),
    // Planning rules (common practice defaults, within hard maxima). Left out: unchanged.
    processingLimits: ProcessingLimitsSchema.optional(),
    liftPerSitting: LiftPerSittingSchema.optional(),
  })
  .strict()
  .refine((s) => s.quietFrom !== s.quietTo, { message: 'Quiet hours must start and end at different times', path: ['quietTo'] });
export type SalonSettings = z.infer<typeof SalonSettingsSchema>;
export type SalonSettingsInput = z.input<typeof SalonSettingsSchema>;
