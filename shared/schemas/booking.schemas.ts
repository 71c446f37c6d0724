import { z } from 'zod';
import { DATE_RANGE, IdSchema, InstantInputSchema, InstantSchema, isRealDateTime, isWithinDateRange, LocalDateSchema, StepKindSchema } from './common.schemas';
import { StepPlanSchema } from './step-plan.schemas';
import { OptionalEmailSchema, OptionalPhoneSchema } from './contact.schemas';

/** A wall-clock time in the salon's zone, `YYYY-MM-DDTHH:mm`, within DATE_RANGE. */
export const LocalDateTimeSchema = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/, 'Use a time like 2027-03-14T09:30')
  .refine(isRealDateTime, 'Not a real date and time')
  .refine(isWithinDateRange, `Use a date between ${DATE_RANGE.first} and ${DATE_RANGE.last}`);

/** The desk asks for options: a client, a service, its (possibly edited) step plan, a stylist or any. */
export const BookingOptionsRequestSchema = z
  .object({
    clientId: IdSchema,
    serviceId: IdSchema,
    stepPlan: StepPlanSchema,
    stylistId: IdSchema.nullable(),
    earliestDate: LocalDateSchema,
    limit: z.number().int().min(1).max(20).default(6),
  })
  .strict();
export type BookingOptionsRequest = z.input<typeof BookingOptionsRequestSchema>;

export const PlannedStepViewSchema = z.object({
  kind: StepKindSchema,
  label: z.string(),
  start: InstantSchema,
  end: InstantSchema,
  basinId: IdSchema.nullable(),
  basinName: z.string().nullable(),
});

export const BookingOptionSchema = z.object({
  stylistId: IdSchema,
  stylistName: z.string(),
  sittings: z.array(z.object({ chairId: IdSchema, chairName: z.string(), start: InstantSchema, end: InstantSchema, steps: z.array(PlannedStepViewSchema) })),
  /** Minutes the client holds a chair, all sittings together. */
  chairMinutes: z.number().int(),
  /** Minutes of developing time in which the stylist's hands are free for someone else. */
  handsFreeMinutes: z.number().int(),
  /** The skin-test footing this option would be booked on ("waiting": the colour cannot start until a negative reading). */
  skinTest: z.enum(['not_needed', 'passed', 'waiting']),
});
export type BookingOption = z.infer<typeof BookingOptionSchema>;

export const SkinTestCheckSchema = z.object({
  required: z.boolean(),
  /** False when the service cannot be booked at all for now (no test, or a positive or unclear one). */
  ok: z.boolean(),
  /** What the client's record allows: passed (read negative), waiting (applied, not read yet), blocked, or not needed. */
  status: z.enum(['not_needed', 'passed', 'waiting', 'blocked']),
  message: z.string(),
  /** The earliest start the skin-test rule allows, when it allows one. */
  earliestAllowed: InstantSchema.nullable(),
});
export type SkinTestCheck = z.infer<typeof SkinTestCheckSchema>;

export const BookingOptionsResponseSchema = z.object({
  timeZone: z.string(),
  skinTest: SkinTestCheckSchema,
  options: z.array(BookingOptionSchema),
});
export type BookingOptionsResponse = z.infer<typeof BookingOptionsResponseSchema>;

/** Book one option: the same request plus the chosen stylist and first-sitting start. */
export const CreateBookingSchema = z
  .object({
    clientId: IdSchema,
    serviceId: IdSchema,
    stepPlan: StepPlanSchema,
    stylistId: IdSchema,
    /** The first sitting's start as shown in the option (ISO 8601 with offset). */
    start: InstantInputSchema,
    /** The chair shown for each sitting in the option; kept when still free, else the engine picks another. */
    chairIds: z.array(IdSchema).max(6).optional(),
    /** A retried request with the same key answers the first result instead of booking twice. */
    idempotencyKey: z.string().min(8).max(100),
    /** The client's consultation quote this booking carries out (its price and deposit apply). */
    quoteId: IdSchema.optional(),
  })
  .strict();
export type CreateBooking = z.infer<typeof CreateBookingSchema>;

export const MoveSittingSchema = z
  .object({
    sitting: z.number().int().min(1),
    start: InstantInputSchema,
    /** Another stylist with the skill; the booking's own stylist when left out. */
    stylistId: IdSchema.optional(),
    /** The chair to keep when it is free at the new time (an undo names the old one); the sitting's own when left out. */
    chairId: IdSchema.optional(),
  })
  .strict();

/** Which sitting to find free times for (1 by default), with which stylist, from which local date. */
export const DeskMoveTimesQuerySchema = z
  .object({
    sitting: z
      .string()
      .regex(/^[1-9]$/, 'A sitting number from 1 to 9')
      .default('1'),
    stylistId: IdSchema.optional(),
    from: LocalDateSchema.optional(),
  })
  .strict();

export const CancelBookingSchema = z.object({ reason: z.string().trim().min(3, 'Say why, in a few words').max(500) }).strict();

export const AuditEntrySchema = z.object({
  at: InstantSchema,
  actor: z.string().nullable(),
  action: z.string(),
  before: z.unknown().nullable(),
  after: z.unknown().nullable(),
});
export const BookingHistorySchema = z.object({ entries: z.array(AuditEntrySchema) });

export const CreateClientSchema = z
  .object({
    name: z.string().trim().min(1, 'Enter a name').max(120),
    email: OptionalEmailSchema.optional(),
    phone: OptionalPhoneSchema.optional(),
    notes: z.string().max(2000).optional(),
  })
  .strict();

/** The desk replaces a booking's step plan, each sitting kept at its start (e.g. colour that needs no skin test). */
export const ChangePlanSchema = z.object({ stepPlan: StepPlanSchema }).strict();
