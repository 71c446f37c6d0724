import { z } from 'zod';
import { CalculatorError, parseRatio } from '../calculators/developer';
import { IdSchema, InstantSchema } from './common.schemas';

/** Generic product types (trade words, never brands). */
export const ProductTypeSchema = z.enum(['lightener', 'remover', 'permanent', 'demi_permanent', 'direct_dye', 'toner', 'bond_builder']);
export type ProductType = z.infer<typeof ProductTypeSchema>;

export const MixPartSchema = z
  .object({
    part: z.string().trim().min(1, 'Name the part (e.g. lightener, developer)').max(80),
    grams: z.number().min(0, 'Grams cannot be negative').max(5000, 'At most 5000 g'),
  })
  .strict();

const minutes = z.number().int('Whole minutes').min(0, 'Minutes cannot be negative').max(600, 'At most 600 minutes').nullable();

/** One bowl of a sitting, as the stylist writes it; the salon maximum is checked on the server (it is a salon setting). */
export const WriteMixLogSchema = z
  .object({
    sittingSeq: z.number().int().min(1, 'Sittings start at 1'),
    bowlNo: z.number().int().min(1, 'Bowls start at 1').max(30),
    productType: ProductTypeSchema,
    shadeNotes: z.string().max(500),
    developerPercent: z.number().min(0, 'Developer strength cannot be negative').max(100).nullable(),
    ratio: z.string().trim().max(40),
    grams: z.array(MixPartSchema).min(1, 'Weigh at least one part').max(8),
    appliedTo: z.string().max(200),
    plannedMinutes: minutes,
    actualMinutes: minutes,
    heat: z.boolean(),
    resultNotes: z.string().max(1000),
  })
  .strict()
  .superRefine((log, ctx) => {
    // An empty ratio is allowed (direct dye straight from the tube); a written one must parse.
    if (log.ratio === '') return;
    try {
      parseRatio(log.ratio);
    } catch (e) {
      if (!(e instanceof CalculatorError)) throw e;
      ctx.addIssue({ code: 'custom', path: ['ratio'], message: e.message });
    }
  });
export type WriteMixLog = z.infer<typeof WriteMixLogSchema>;

/** "Repeat last time": the bowls of sitting `sitting` of booking `fromBookingId` go into `intoSitting` of this booking. */
export const RepeatMixLogSchema = z
  .object({ fromBookingId: IdSchema, sitting: z.number().int().min(1), intoSitting: z.number().int().min(1) })
  .strict();

export const MixLogSchema = z.object({
  id: IdSchema,
  sittingSeq: z.number(),
  bowlNo: z.number(),
  productType: ProductTypeSchema,
  shadeNotes: z.string(),
  developerPercent: z.number().nullable(),
  /** The same strength as volume (definition factor), for bottles labelled in volumes. */
  developerVolume: z.number().nullable(),
  ratio: z.string(),
  grams: z.array(z.object({ part: z.string(), grams: z.number() })),
  appliedTo: z.string(),
  plannedMinutes: z.number().nullable(),
  actualMinutes: z.number().nullable(),
  heat: z.boolean(),
  resultNotes: z.string(),
  createdAt: InstantSchema,
});
export type MixLog = z.infer<typeof MixLogSchema>;

export const SittingUsageSchema = z.object({
  seq: z.number(),
  start: InstantSchema,
  started: z.boolean(),
  /** Grams used per product type at this sitting (all parts of its bowls). */
  totals: z.array(z.object({ productType: ProductTypeSchema, grams: z.number() })),
  totalGrams: z.number(),
  /** Grams × the owner's cost per gram per product type; null while no cost is set for a type used. */
  estimatedCostCents: z.number().int().nullable(),
});

export const MixLogListSchema = z.object({
  maxDeveloperPercent: z.number(),
  sittings: z.array(SittingUsageSchema),
  logs: z.array(MixLogSchema),
});
export type MixLogList = z.infer<typeof MixLogListSchema>;

export const RepeatMixLogResultSchema = z.object({ copied: z.number(), logs: z.array(MixLogSchema) });
