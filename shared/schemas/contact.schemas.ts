import { z } from 'zod';
import { parsePhoneNumberFromString, type CountryCode } from 'libphonenumber-js';

/**
 * Numbers typed without a country code are read as this country's: the demo salon is in the US. A salon in
 * another country would pass its own (the salon record has no country column yet).
 */
export const DEFAULT_PHONE_COUNTRY: CountryCode = 'US';
export const PHONE_HINT = 'Enter a mobile number, e.g. +1 970 555 0142';

/** The number in E.164 (+19705550142), or null when libphonenumber-js does not find a valid number. */
export function toE164(input: string, country: CountryCode = DEFAULT_PHONE_COUNTRY): string | null {
  const parsed = parsePhoneNumberFromString(input.trim(), country);
  return parsed?.isValid() ? parsed.number : null;
}

/** Reads a typed number into E.164, or reports the hint on the field; '' is passed on for optional use. */
function readPhone(optional: boolean) {
  return z
    .string()
    .trim()
    .max(40, PHONE_HINT)
    .transform((s, ctx): string | null => {
      if (optional && s === '') return null;
      const e164 = toE164(s);
      if (!e164) ctx.addIssue({ code: 'custom', message: PHONE_HINT });
      return e164 ?? z.NEVER;
    });
}

/** A phone number, stored in E.164 whatever spacing or punctuation it was typed with. */
export const PhoneSchema = readPhone(false).transform((s) => s!);
/** An optional phone number: '' means none (null). */
export const OptionalPhoneSchema = readPhone(true);

export const EmailSchema = z.string().trim().toLowerCase().pipe(z.email('Enter a valid e-mail address').max(254));
/** An optional e-mail address: '' means none (null); one message for anything else that is not an address. */
export const OptionalEmailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .max(254)
  .refine((s) => s === '' || z.email().safeParse(s).success, 'Enter a valid e-mail address')
  .transform((s) => s || null);

export const MessageChannelSchema = z.enum(['sms', 'email', 'both']);
export type MessageChannelChoice = z.infer<typeof MessageChannelSchema>;

/** How a client wants service messages, and whether marketing follow-ups may be sent at all. */
export const MessagePreferencesSchema = z.object({
  messageChannel: MessageChannelSchema,
  marketingOptIn: z.boolean(),
});

/** The chosen channel must be one the client can be reached on. */
export function channelReachable(v: { messageChannel: MessageChannelChoice; phone: string | null; email: string | null }, ctx: z.RefinementCtx) {
  if (v.messageChannel !== 'email' && !v.phone) ctx.addIssue({ code: 'custom', path: ['phone'], message: 'Add a mobile number to get text messages, or choose e-mail' });
  if (v.messageChannel !== 'sms' && !v.email) ctx.addIssue({ code: 'custom', path: ['email'], message: 'Add an e-mail address to get e-mails, or choose SMS' });
}

/** The desk edits a client card: contact details and message preferences together. */
export const UpdateClientSchema = z
  .object({
    name: z.string().trim().min(1, 'Enter a name').max(120),
    email: OptionalEmailSchema,
    phone: OptionalPhoneSchema,
    ...MessagePreferencesSchema.shape,
  })
  .strict()
  .superRefine(channelReachable);

/** A client edits their own phone and preferences (their e-mail is their sign-in, changed elsewhere). */
export const MyPreferencesBodySchema = z
  .object({ phone: OptionalPhoneSchema, ...MessagePreferencesSchema.shape })
  .strict();

export const MyPreferencesSchema = z.object({
  email: z.string().nullable(),
  phone: z.string().nullable(),
  ...MessagePreferencesSchema.shape,
  /** When the client replied STOP to a text; SMS stays off until they reply START. */
  smsStoppedAt: z.string().nullable(),
});
export type MyPreferences = z.infer<typeof MyPreferencesSchema>;

export const myPreferencesPath = '/api/me/preferences';
