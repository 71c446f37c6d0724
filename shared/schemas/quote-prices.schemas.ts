import { z } from 'zod';
import { CostedProductSchema } from './mix-log.schemas';

const centsPerGram = z.number({ error: 'Give a cost or leave it empty' }).min(0, 'A cost cannot be negative').max(10_000, 'At most 10000 cents a gram');

/** What quotes and mix-log cost estimates are priced from; the owner sets them. */
export const QuotePricesSchema = z
  .object({
    correctionCentsPerHour: z.number({ error: 'Give the hourly rate' }).int('Whole cents').min(0, 'The rate cannot be negative').max(1_000_000),
    // Per gram of each product as weighed into the bowl, developer apart. An empty box in the form arrives as
    // undefined: no cost set for that product.
    productCentsPerGram: z.partialRecord(CostedProductSchema, centsPerGram.optional()),
  })
  .strict();
export type QuotePrices = z.infer<typeof QuotePricesSchema>;
