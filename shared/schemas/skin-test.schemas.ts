import { z } from 'zod';
import { IdSchema, InstantInputSchema, InstantSchema } from './common.schemas';

export const SkinTestResultSchema = z.enum(['pending', 'negative', 'positive', 'unclear']);

export const RecordSkinTestSchema = z
  .object({
    appliedAt: InstantInputSchema,
    readAt: InstantInputSchema.nullable(),
    result: SkinTestResultSchema,
    product: z.string().max(200).default(''),
    notes: z.string().max(1000).default(''),
  })
  .strict()
  .refine((t) => (t.result === 'pending') === (t.readAt === null), { message: 'A read result needs the time it was read', path: ['readAt'] });

export const SkinTestSchema = z.object({
  id: IdSchema,
  appliedAt: InstantSchema,
  readAt: InstantSchema.nullable(),
  result: SkinTestResultSchema,
  product: z.string(),
  notes: z.string(),
  /** Who recorded it (null when recorded by the demo loader or a removed account). */
  recordedByName: z.string().nullable(),
});
export const SkinTestListSchema = z.object({ tests: z.array(SkinTestSchema) });
