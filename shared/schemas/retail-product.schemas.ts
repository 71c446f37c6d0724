import { z } from 'zod';
import { IdSchema } from './common.schemas';

const MAX_STOCK = 100_000;
const stockCount = z
  .number({ error: 'Enter how many are in stock' })
  .int('Whole items')
  .min(0, 'Stock cannot be below zero')
  .max(MAX_STOCK, `At most ${MAX_STOCK}`);

/** A retail product as the owner adds it: name, price in minor units, how many are in stock. */
export const RetailProductInputSchema = z
  .object({
    name: z.string().trim().min(1, 'Enter a name').max(120),
    priceCents: z.number({ error: 'Enter a price' }).int('Whole minor units').min(0, 'The price cannot be negative').max(10_000_000),
    stock: stockCount,
  })
  .strict();
export type RetailProductInput = z.infer<typeof RetailProductInputSchema>;

/**
 * A change to a product. `stockSeen` is the stock the form showed: a new count is written only while the stock
 * still stands there, so a sale made meanwhile is never counted over (409 naming `stock`). `active` false retires
 * the product (checkout no longer offers it); true puts it back on sale.
 */
export const RetailProductChangeSchema = RetailProductInputSchema.extend({
  stockSeen: stockCount,
  active: z.boolean(),
}).strict();
export type RetailProductChange = z.infer<typeof RetailProductChangeSchema>;

export const RetailProductSchema = z.object({
  id: IdSchema,
  name: z.string(),
  priceCents: z.number().int(),
  stock: z.number().int(),
  active: z.boolean(),
});
export type RetailProduct = z.infer<typeof RetailProductSchema>;
export const RetailProductListSchema = z.object({ products: z.array(RetailProductSchema) });
