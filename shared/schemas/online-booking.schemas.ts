import { z } from 'zod';
import { IdSchema, InstantInputSchema, InstantSchema, LocalDateSchema } from './common.schemas';
import { ServiceCategorySchema } from './service.schemas';

/** The salon's public page: what it offers and on what terms (no client data). */
export const PublicSalonSchema = z.object({
  slug: z.string(),
  name: z.string(),
  address: z.string(),
  phone: z.string(),
  /** The phone number as people write it in the salon's country, e.g. (970) 555-0148. */
  phoneText: z.string(),
  timeZone: z.string(),
  currency: z.string(),
  openingHours: z.array(z.string()),
  policies: z.object({
    deposit: z.string(),
    cancellation: z.string(),
    lateness: z.string(),
    skinTest: z.string(),
  }),
  services: z.array(
    z.object({
      id: IdSchema,
      name: z.string(),
      description: z.string(),
      category: ServiceCategorySchema,
      typicalMinutes: z.number().int(),
      priceCents: z.number().int(),
      priceIsFrom: z.boolean(),
      depositCents: z.number().int(),
      onlineBookable: z.boolean(),
      /** The skill a stylist needs for it: only stylists who have it are offered. */
      skill: z.string(),
      /** Oxidative colour: a skin test is needed first (and usually a consultation). */
      needsSkinTest: z.boolean(),
    }),
  ),
  stylists: z.array(z.object({ id: IdSchema, name: z.string(), skills: z.array(z.string()) })),
});
export type PublicSalon = z.infer<typeof PublicSalonSchema>;

export const SlugParamsSchema = z.object({ slug: z.string().regex(/^[a-z0-9-]{1,80}$/) }).strict();

export const AvailabilityQuerySchema = z.object({ serviceId: IdSchema, stylistId: IdSchema.optional(), from: LocalDateSchema.optional() }).strict();

/** Free start times for an online-bookable service over the next weeks (salon time, grouped by the client). */
export const AvailabilitySchema = z.object({
  timeZone: z.string(),
  times: z.array(z.object({ start: InstantSchema, end: InstantSchema, stylistId: IdSchema, stylistName: z.string() })),
});
export type Availability = z.infer<typeof AvailabilitySchema>;

export const CreateHoldSchema = z.object({ salonSlug: z.string().max(80), serviceId: IdSchema, stylistId: IdSchema, start: InstantInputSchema }).strict();

/** A hold: the time kept for a few minutes while the client signs in and pays. Keep `holdSecret` to claim it. */
export const HoldSchema = z.object({
  holdId: IdSchema,
  status: z.enum(['held', 'booked', 'lapsed']),
  heldUntil: InstantSchema.nullable(),
  salonName: z.string(),
  serviceName: z.string(),
  stylistName: z.string(),
  start: InstantSchema,
  end: InstantSchema,
  timeZone: z.string(),
  depositCents: z.number().int(),
  currency: z.string(),
});
export type Hold = z.infer<typeof HoldSchema>;
export const CreatedHoldSchema = HoldSchema.extend({ holdSecret: z.string() });
export const HoldSecretSchema = z.object({ secret: z.string().min(20).max(100) }).strict();
export const HoldParamsSchema = z.object({ id: IdSchema }).strict();

/** The cautions a client reads and accepts before paying; `version` is stored with the acceptance. */
export const CautionsSchema = z.object({
  version: z.string(),
  items: z.array(z.object({ id: z.string(), title: z.string(), text: z.string() })),
});
export type Cautions = z.infer<typeof CautionsSchema>;
export const ClaimedHoldSchema = HoldSchema.extend({ cautions: CautionsSchema });

/** Where a signed-in client's unpaid hold stands in the flow: the step they go back to when they resume. */
export const HoldStepSchema = z.enum(['details', 'cautions', 'deposit']);
export type HoldStep = z.infer<typeof HoldStepSchema>;
/** A client's own hold, not paid yet (at most one at a time): enough to show it and to go back into its flow. */
export const OpenHoldSchema = HoldSchema.extend({ salonSlug: z.string(), serviceId: IdSchema, step: HoldStepSchema });
export type OpenHold = z.infer<typeof OpenHoldSchema>;
export const MyHoldsSchema = z.object({ holds: z.array(OpenHoldSchema) });
/** Resuming hands out a new secret (the old tab's one stops working) and the cautions to read. */
export const ResumedHoldSchema = OpenHoldSchema.extend({ holdSecret: z.string(), cautions: CautionsSchema });
export const ResumeHoldSchema = z.object({}).strict();
/** Releasing: the client's own (claimed) hold needs no secret; a hold not claimed yet needs the one it was made with. */
export const ReleaseHoldSchema = z.object({ secret: z.string().min(20).max(100).optional() }).strict();
export const AcceptCautionsSchema = z.object({ version: z.string().min(1).max(40), secret: z.string().min(20).max(100) }).strict();

/** Paying a held time: the amount is the server's and the card is typed on the payment provider's own page. */
export const PayHoldSchema = z.object({ secret: z.string().min(20).max(100) }).strict();

/**
 * What cancelling now does to the deposit (desk and client alike), the rule that decided it, and the words to read:
 * no deposit; a hold not paid yet; refunded in full as the skin-test record now blocks the colour; the salon keeps
 * nothing; inside or outside the cancellation window.
 */
export const CancelTermsSchema = z.object({
  depositOutcome: z.enum(['kept', 'refunded']).nullable(),
  why: z.enum(['no_deposit', 'not_paid', 'skin_test_blocked', 'salon_keeps_nothing', 'inside_window', 'outside_window']),
  message: z.string(),
});
export type CancelTerms = z.infer<typeof CancelTermsSchema>;
export const ClientCancelSchema = z.object({ reason: z.string().trim().max(500).default('Cancelled by the client') }).strict();
export const ClientMoveSchema = z.object({ start: InstantInputSchema }).strict();
/**
 * How the first message of a booking (its confirmation) stands on each channel, from the send log: `waiting` is a
 * text held back by the salon's quiet hours until `sendAt`.
 */
export const ConfirmationSendsSchema = z.object({
  timeZone: z.string(),
  quietHours: z.object({ from: z.string(), to: z.string() }).nullable(),
  sends: z.array(
    z.object({
      channel: z.enum(['email', 'sms']),
      status: z.enum(['sent', 'sending', 'waiting', 'failed']),
      sendAt: InstantSchema,
      sentAt: InstantSchema.nullable(),
    }),
  ),
});
export type ConfirmationSends = z.infer<typeof ConfirmationSendsSchema>;
export const MoveTimesQuerySchema = z.object({ from: LocalDateSchema.optional() }).strict();
