import { z } from 'zod';
import { IdSchema, InstantInputSchema, InstantSchema, typedText } from './common.schemas';

export const SkinTestResultSchema = z.enum(['pending', 'negative', 'positive', 'unclear']);
/** What a reading can find; `pending` is the state before it. */
export const SkinTestReadingResultSchema = SkinTestResultSchema.exclude(['pending']);

/** Shared by the form's check and the server's check of a reading against the stored applied time. */
export const READ_BEFORE_APPLIED = 'A test cannot be read before it was applied';

export const RecordSkinTestSchema = z
  .object({
    appliedAt: InstantInputSchema,
    readAt: InstantInputSchema.nullable(),
    result: SkinTestResultSchema,
    product: z.string().max(200).default(''),
    notes: z.string().max(1000).default(''),
  })
  .strict()
  .refine((t) => (t.result === 'pending') === (t.readAt === null), { message: 'A read result needs the time it was read', path: ['readAt'] })
  .refine((t) => t.readAt === null || Date.parse(t.readAt) >= Date.parse(t.appliedAt), { message: READ_BEFORE_APPLIED, path: ['readAt'] });

/** The reading of a test recorded as applied and not yet read; the server checks it against the applied time and the clock. */
export const RecordSkinTestReadingSchema = z
  .object({
    readAt: InstantInputSchema,
    result: SkinTestReadingResultSchema,
  })
  .strict();
export type RecordSkinTestReading = z.infer<typeof RecordSkinTestReadingSchema>;

export const SkinTestReadingParamsSchema = z.object({ id: IdSchema, testId: IdSchema }).strict();

export const SkinTestSchema = z.object({
  id: IdSchema,
  appliedAt: InstantSchema,
  readAt: InstantSchema.nullable(),
  result: SkinTestResultSchema,
  product: z.string(),
  notes: z.string(),
  /** Who recorded it, as named when they did (null when recorded by the demo loader). */
  recordedByName: z.string().nullable(),
  /** Who recorded the reading, as named then (null while pending or for loaded records). */
  readByName: z.string().nullable(),
});
export type SkinTest = z.infer<typeof SkinTestSchema>;
/** An owner's recorded decision that lets oxidative colour follow a positive skin test (who, when, why). */
export const SkinTestClearanceSchema = z.object({ id: IdSchema, recordedAt: InstantSchema, recordedByName: z.string(), reason: z.string() });
export type SkinTestClearance = z.infer<typeof SkinTestClearanceSchema>;
export const RecordClearanceSchema = z
  .object({
    reason: typedText(2000).pipe(z.string().trim().min(10, 'Say why colour may follow the reaction (at least 10 characters), e.g. the written medical advice')),
  })
  .strict();

export const SkinTestListSchema = z.object({ tests: z.array(SkinTestSchema), clearances: z.array(SkinTestClearanceSchema) });
