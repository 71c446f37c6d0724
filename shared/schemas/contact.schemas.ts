import { z } from 'zod';
import { DEFAULT_PHONE_COUNTRY } from '../format/locale';

/**
 * Numbers typed without a country code are read as the salon's country's (a salon setting, ISO 3166-1
 * alpha-2; the demo salon is in the US). The schemas here only check that something like a number was
 * typed; the server, which knows the salon, reads it into E.164 with `toE164` (shared/format/phone.ts, through
 * server/lib/stored-phone.ts).
 */
export const PHONE_HINT = 'Enter a mobile number, e.g. +1 970 555 0142';

/** A country's English name from its ISO 3166-1 alpha-2 code (the code itself if the runtime has no name). */
export function countryName(code: string): string {
  return new Intl.DisplayNames(['en'], { type: 'region' }).of(code) ?? code;
}

/** What to tell someone whose number could not be read, in the salon's country. */
export function phoneHint(country: string): string {
  if (country === DEFAULT_PHONE_COUNTRY) return PHONE_HINT;
  return `Enter a mobile number with its country code, or as dialled in ${countryName(country)}`;
}

// Digits with the usual punctuation, at least five digits: anything else is not an attempt at a number.
const looksLikePhone = (s: string) => /^\+?[\d\s().\-/]+$/.test(s) && (s.match(/\d/g)?.length ?? 0) >= 5;

/** A typed phone number (read into E.164 by the server, in the salon's country). */
export const PhoneSchema = z.string().trim().max(40, PHONE_HINT).refine(looksLikePhone, PHONE_HINT);
/** An optional phone number: '' means none (null). */
export const OptionalPhoneSchema = z
  .string()
  .trim()
  .max(40, PHONE_HINT)
  .refine((s) => s === '' || looksLikePhone(s), PHONE_HINT)
  .transform((s) => s || null);

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
  if (v.messageChannel !== 'email' && !v.phone)
    ctx.addIssue({ code: 'custom', path: ['phone'], message: 'Add a mobile number to get text messages, or choose e-mail' });
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
export const MyPreferencesBodySchema = z.object({ phone: OptionalPhoneSchema, ...MessagePreferencesSchema.shape }).strict();

export const MyPreferencesSchema = z.object({
  email: z.string().nullable(),
  phone: z.string().nullable(),
  ...MessagePreferencesSchema.shape,
  /** When the client replied STOP to a text; SMS stays off until they reply START. */
  smsStoppedAt: z.string().nullable(),
});
export type MyPreferences = z.infer<typeof MyPreferencesSchema>;
