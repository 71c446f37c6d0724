import { z } from 'zod';
import { IdSchema, InstantInputSchema, InstantSchema } from './common.schemas';
import { ProductTypeSchema } from './mix-log.schemas';

/** How the test strand came out; the consultation's strand-test answer uses the same words plus "none". */
export const StrandResultSchema = z.enum(['passed', 'fragile', 'failed']);

/** A strand test as the stylist records it; the salon's developer maximum is checked on the server. */
export const RecordStrandTestSchema = z
  .object({
    testedAt: InstantInputSchema,
    tested: z.string().trim().min(1, 'Say what was tested (product and where on the head)').max(300),
    productType: ProductTypeSchema,
    developerPercent: z.number().min(0, 'Developer strength cannot be negative').max(100).nullable(),
    minutes: z.number({ error: 'Give the minutes' }).int('Whole minutes').min(1, 'At least 1 minute').max(240, 'At most 240 minutes'),
    result: StrandResultSchema,
    notes: z.string().max(1000),
    photoId: IdSchema.nullable(),
  })
  .strict();
export type RecordStrandTest = z.infer<typeof RecordStrandTestSchema>;

export const StrandTestSchema = z.object({
  id: IdSchema,
  testedAt: InstantSchema,
  tested: z.string(),
  productType: ProductTypeSchema,
  developerPercent: z.number().nullable(),
  minutes: z.number().int(),
  result: StrandResultSchema,
  notes: z.string(),
  photoId: IdSchema.nullable(),
  recordedByName: z.string().nullable(),
});
export type StrandTest = z.infer<typeof StrandTestSchema>;
export const StrandTestListSchema = z.object({ tests: z.array(StrandTestSchema) });
