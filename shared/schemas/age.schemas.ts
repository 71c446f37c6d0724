import { z } from 'zod';
import { IdSchema, InstantSchema, LocalDateSchema, typedText } from './common.schemas';

/** A date of birth, or null to remove it; not before 1900 and not in the future (checked on the server). */
export const DateOfBirthBodySchema = z.object({ dateOfBirth: LocalDateSchema.refine((d) => d >= '1900-01-01', 'Not before 1900').nullable() }).strict();

/** A guardian's consent to oxidative colour for a client under 16, as the desk records it. */
export const RecordGuardianConsentSchema = z
  .object({
    guardianName: typedText(120).pipe(z.string().trim().min(1, 'Enter the guardian’s name')),
    relationship: typedText(60).pipe(z.string().trim().min(1, 'Say how they are related, e.g. mother')),
    note: typedText(1000),
  })
  .strict();

export const GuardianConsentSchema = z.object({
  id: IdSchema,
  guardianName: z.string(),
  relationship: z.string(),
  note: z.string(),
  recordedByName: z.string(),
  recordedAt: InstantSchema,
});
export type GuardianConsent = z.infer<typeof GuardianConsentSchema>;

export const ClientAgeSchema = z.object({ dateOfBirth: LocalDateSchema.nullable(), guardianConsents: z.array(GuardianConsentSchema) });
export type ClientAge = z.infer<typeof ClientAgeSchema>;
