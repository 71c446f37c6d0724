import { z } from 'zod';
import { IdSchema, InstantInputSchema, InstantSchema, LocalDateSchema } from './common.schemas';

export const WindowFitSchema = z.object({ serviceId: IdSchema, name: z.string(), minutes: z.number().int() });

/** An offer sent for a window time, and what became of it (offered, taken, gone, expired). */
export const SentOfferSchema = z.object({
  stylistId: IdSchema,
  start: InstantSchema,
  clientName: z.string(),
  serviceName: z.string(),
  status: z.enum(['offered', 'taken', 'gone', 'expired']),
});
export type SentOffer = z.infer<typeof SentOfferSchema>;

/** A stylist's hands-free window with what fits and who on the standby list wants one of those fits. */
export const HandsFreeWindowSchema = z.object({
  stylistId: IdSchema,
  start: InstantSchema,
  end: InstantSchema,
  minutes: z.number().int(),
  fits: z.array(WindowFitSchema),
  standby: z.array(z.object({ entryId: IdSchema, clientId: IdSchema, clientName: z.string(), serviceIds: z.array(IdSchema) })),
  /** Offers sent for a time inside this window. */
  offers: z.array(SentOfferSchema),
  /**
   * Freed minutes (docs/glossary.md): hands a sitting under way no longer needs as the day now runs (it finished
   * early, or moved), rather than a client's developing time as booked. The book still holds that sitting's booked
   * times, so such a window is shown and called about, not filled from here.
   */
  freed: z.boolean(),
});
export type HandsFreeWindowView = z.infer<typeof HandsFreeWindowSchema>;
export const WindowsQuerySchema = z.object({ date: LocalDateSchema.optional(), stylistId: IdSchema.optional() }).strict();
/** The day's windows, and the day's offers whose window has since closed (filled, booked or moved into). */
export const WindowListSchema = z.object({ timeZone: z.string(), windows: z.array(HandsFreeWindowSchema), closedOffers: z.array(SentOfferSchema) });

/** Book a walk-in or a standby client straight into a window. */
export const FillWindowSchema = z
  .object({
    stylistId: IdSchema,
    serviceId: IdSchema,
    start: InstantInputSchema,
    /** When given, the fit goes at the earliest free start from `start` up to this one (e.g. the window's end less the fit). */
    latestStart: InstantInputSchema.optional(),
    clientId: IdSchema.optional(),
    /** A walk-in with no client record yet. */
    walkIn: z
      .object({ name: z.string().trim().min(1).max(120), phone: z.string().max(30).optional() })
      .strict()
      .optional(),
    standbyEntryId: IdSchema.optional(),
    idempotencyKey: z.string().min(8).max(100),
  })
  .strict()
  .refine((b) => Boolean(b.clientId) !== Boolean(b.walkIn), { message: 'Pick a client or enter a walk-in', path: ['clientId'] });

/** Offer a window to standby clients by SMS and e-mail; the first to accept gets it. */
export const OfferWindowSchema = z
  .object({
    stylistId: IdSchema,
    serviceId: IdSchema,
    start: InstantInputSchema,
    standbyEntryIds: z.array(IdSchema).min(1).max(20),
  })
  .strict();
/** How many standby clients were sent the offer. */
export const OfferWindowResultSchema = z.object({ offers: z.number() });

export const OfferViewSchema = z.object({
  status: z.enum(['offered', 'taken', 'gone', 'expired']),
  salonName: z.string(),
  serviceName: z.string(),
  stylistName: z.string(),
  start: InstantSchema,
  timeZone: z.string(),
  clientName: z.string(),
});
export const OfferTokenParamsSchema = z.object({ token: z.string().min(20).max(100) }).strict();
