import { z } from 'zod';
import { CalculatorError, parseRatio } from '../calculators/developer';
import { BookingStatusSchema, IdSchema, InstantSchema, typedText, type BookingStatus } from './common.schemas';

/** Generic product types (trade words, never brands). */
export const ProductTypeSchema = z.enum(['lightener', 'remover', 'permanent', 'demi_permanent', 'direct_dye', 'toner', 'bond_builder']);
export type ProductType = z.infer<typeof ProductTypeSchema>;

/** What the owner can set a cost per gram for (Set-up → Quote prices): the product types and developer. */
export const CostedProductSchema = z.enum([...ProductTypeSchema.options, 'developer']);
export type CostedProduct = z.infer<typeof CostedProductSchema>;

/**
 * What one weighed part of a bowl is. A bowl of lightener is lightener grams plus developer grams, and each
 * is counted and costed as itself; `other` is water, non-peroxide cream or an additive, weighed but not costed.
 */
export const MixPartKindSchema = z.enum([...CostedProductSchema.options, 'other']);
export type MixPartKind = z.infer<typeof MixPartKindSchema>;

export const MixPartSchema = z
  .object({
    kind: MixPartKindSchema,
    /** The stylist's own words for the part (e.g. "blue powder", "cream developer"); may be empty. */
    part: typedText(80).trim(),
    grams: z.number().min(0, 'Grams cannot be negative').max(5000, 'At most 5000 g'),
  })
  .strict();
export type MixPart = z.infer<typeof MixPartSchema>;

const sittingNo = z.number().int().min(1, 'Sittings start at 1').max(30, 'No booking has that many sittings');
const minutes = z.number().int('Whole minutes').min(0, 'Minutes cannot be negative').max(600, 'At most 600 minutes').nullable();

/** One bowl of a sitting, as the stylist writes it; the salon maximum is checked on the server (it is a salon setting). */
export const WriteMixLogSchema = z
  .object({
    sittingSeq: sittingNo,
    bowlNo: z.number().int().min(1, 'Bowls start at 1').max(30),
    productType: ProductTypeSchema,
    shadeNotes: typedText(500),
    developerPercent: z.number().min(0, 'Developer strength cannot be negative').max(100).nullable(),
    ratio: typedText(40).trim(),
    grams: z.array(MixPartSchema).min(1, 'Weigh at least one part').max(8),
    appliedTo: typedText(200),
    plannedMinutes: minutes,
    actualMinutes: minutes,
    heat: z.boolean(),
    resultNotes: typedText(1000),
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
export const RepeatMixLogSchema = z.object({ fromBookingId: IdSchema, sitting: sittingNo, intoSitting: sittingNo }).strict();

/**
 * Bowls may be written for any sitting of a booking that is not cancelled, before it starts too: the formula is
 * usually mixed before the client reaches the basin. The server refuses the rest; the page hides the form.
 */
export const mixLogWritable = (status: BookingStatus) => status !== 'cancelled';

export const MixLogSchema = z.object({
  id: IdSchema,
  sittingSeq: z.number(),
  bowlNo: z.number(),
  productType: ProductTypeSchema,
  shadeNotes: z.string(),
  developerPercent: z.number().nullable(),
  /** The same strength in trade volumes (3 % = 10 vol), as developer bottles are labelled. */
  developerVolume: z.number().nullable(),
  ratio: z.string(),
  grams: z.array(z.object({ kind: MixPartKindSchema, part: z.string(), grams: z.number() })),
  appliedTo: z.string(),
  plannedMinutes: z.number().nullable(),
  actualMinutes: z.number().nullable(),
  heat: z.boolean(),
  resultNotes: z.string(),
  createdAt: InstantSchema,
});
export type MixLog = z.infer<typeof MixLogSchema>;

/** Grams of one kind of part used at a sitting, with its cost per gram and cost when the owner has set one. */
export const ProductUseLineSchema = z.object({
  kind: MixPartKindSchema,
  grams: z.number(),
  /** null: no cost set in Quote prices (or `other`, which is never costed). */
  centsPerGram: z.number().nullable(),
  costCents: z.number().int().nullable(),
});
export type ProductUseLine = z.infer<typeof ProductUseLineSchema>;

export const SittingUsageSchema = z.object({
  seq: z.number(),
  start: InstantSchema,
  started: z.boolean(),
  /** Grams used per kind of part at this sitting (every weighed part of its bowls, counted as what it is). */
  totals: z.array(ProductUseLineSchema),
  totalGrams: z.number(),
  /** The lines' costs added up; null while a product or developer used has no cost set. */
  estimatedCostCents: z.number().int().nullable(),
});

/** A sitting of the same client with bowls written, that "Repeat last time" can copy (only ones the caller may read). */
export const RepeatSourceSchema = z.object({
  bookingId: IdSchema,
  sittingSeq: z.number(),
  serviceName: z.string(),
  start: InstantSchema,
  bowls: z.number(),
});
export type RepeatSource = z.infer<typeof RepeatSourceSchema>;

export const MixLogListSchema = z.object({
  bookingStatus: BookingStatusSchema,
  maxDeveloperPercent: z.number(),
  sittings: z.array(SittingUsageSchema),
  logs: z.array(MixLogSchema),
  repeatSources: z.array(RepeatSourceSchema),
});
export type MixLogList = z.infer<typeof MixLogListSchema>;

export const RepeatMixLogResultSchema = z.object({ copied: z.number(), logs: z.array(MixLogSchema) });
