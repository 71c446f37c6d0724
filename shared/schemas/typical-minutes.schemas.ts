import { z } from 'zod';
import { IdSchema } from './common.schemas';

/** How many of the latest finished visits each step's typical minutes are taken over. */
export const TYPICAL_LAST_VISITS = 20;
/** Fewer visits than this say "too few to say" rather than a number. */
export const TYPICAL_MIN_VISITS = 3;

export const TypicalMinutesQuerySchema = z
  .object({
    /** One stylist's figures beside the salon's (a stylist always gets their own, whatever this says). */
    stylistId: IdSchema.optional(),
  })
  .strict();

/**
 * A step's actual minutes over its latest finished visits: the median and the 80th percentile by PostgreSQL's
 * `percentile_cont` (linear interpolation between neighbouring values). Both are null below TYPICAL_MIN_VISITS visits.
 */
export const TypicalFigureSchema = z.object({
  visits: z.number().int(),
  medianMinutes: z.number().nullable(),
  p80Minutes: z.number().nullable(),
});
export type TypicalFigure = z.infer<typeof TypicalFigureSchema>;

export const StylistTypicalFigureSchema = TypicalFigureSchema.extend({ stylistId: IdSchema, name: z.string() });
export type StylistTypicalFigure = z.infer<typeof StylistTypicalFigureSchema>;

/**
 * One step of the service as it was done. A step is known by its sitting, its label and, when the label comes more
 * than once in that sitting (a second "Rinse"), which time it comes: other steps added or taken away do not mix it up.
 */
export const TypicalStepSchema = z.object({
  sitting: z.number().int().min(1),
  label: z.string(),
  occurrence: z.number().int().min(1),
  salon: TypicalFigureSchema,
  /** By stylist name; only the asked-for stylist when one is named. */
  stylists: z.array(StylistTypicalFigureSchema),
});
export type TypicalStep = z.infer<typeof TypicalStepSchema>;

export const TypicalMinutesSchema = z.object({
  serviceId: IdSchema,
  lastVisits: z.number().int(),
  minVisits: z.number().int(),
  /** The stylist the figures were asked for (the caller, for a stylist); null for every stylist. */
  forStylistId: IdSchema.nullable(),
  steps: z.array(TypicalStepSchema),
});
export type TypicalMinutes = z.infer<typeof TypicalMinutesSchema>;
