import { z } from 'zod';
import { StepPlanSchema } from './step-plan.schemas';
import { BookingStatusSchema, IdSchema, InstantSchema, LocalDateSchema, StepKindSchema } from './common.schemas';
import { SittingStatusSchema } from './day-of-service.schemas';
import { ProductFamilySchema } from './step-plan.schemas';
import { DepositSchema } from './payments.schemas';

/** Read models of the book, as the desk, the stylist and the client see them. */
export const StepViewSchema = z.object({
  kind: StepKindSchema,
  label: z.string(),
  start: InstantSchema,
  end: InstantSchema,
  basinName: z.string().nullable(),
  /** For developing steps: the least and most minutes the product may stay on (from the booked step plan). */
  minMinutes: z.number().int().nullable(),
  maxMinutes: z.number().int().nullable(),
  /** What the step puts on the hair, and the salon's processing limit for it (heat counted); null when not limited. */
  product: ProductFamilySchema,
  limitMinutes: z.number().int().nullable(),
  /** When the step really started and ended (tapped on the day); null until then. */
  actualStart: InstantSchema.nullable(),
  actualEnd: InstantSchema.nullable(),
});

export const SittingViewSchema = z.object({
  seq: z.number().int(),
  of: z.number().int(),
  chairId: IdSchema,
  chairName: z.string(),
  start: InstantSchema,
  end: InstantSchema,
  steps: z.array(StepViewSchema),
  /** Where the sitting stands on the day, when its client arrived and how many minutes late. */
  status: SittingStatusSchema,
  arrivedAt: InstantSchema.nullable(),
  lateMinutes: z.number().int().nullable(),
  /** From when the desk may mark a no-show: the planned start plus the salon's grace time. */
  noShowFrom: InstantSchema,
});
export type SittingView = z.infer<typeof SittingViewSchema>;

export const BookingViewSchema = z.object({
  id: IdSchema,
  status: BookingStatusSchema,
  client: z.object({ id: IdSchema, name: z.string() }),
  service: z.object({ id: IdSchema, name: z.string() }),
  stylist: z.object({ id: IdSchema, name: z.string() }),
  priceCents: z.number().int(),
  depositCents: z.number().int(),
  /** Kept or refunded when the booking was cancelled; null otherwise. */
  depositOutcome: z.enum(['kept', 'refunded']).nullable(),
  /** Where the deposit stands from the money that moved: due, paid, refunded or kept. */
  deposit: DepositSchema,
  cancelReason: z.string().nullable(),
  sittings: z.array(SittingViewSchema),
  /**
   * The skin-test footing: `waiting` on an unread test (the colour cannot start until it reads negative), or
   * `blocked` when the client's record no longer allows the colour (cancel or change the plan).
   */
  skinTest: z.object({ status: z.enum(['not_needed', 'passed', 'waiting', 'blocked']), message: z.string() }),
  /** The booking's own step plan (what each step puts on the hair included), as booked or last changed. */
  stepPlan: StepPlanSchema,
});
export type BookingView = z.infer<typeof BookingViewSchema>;

export const StaffSummarySchema = z.object({ id: IdSchema, name: z.string(), skills: z.array(z.string()) });
export const ChairSummarySchema = z.object({ id: IdSchema, name: z.string() });

/** One stretch of a date the salon is open, wall-clock `HH:mm` in its zone. */
export const OpenSpanSchema = z.object({ start: z.string(), end: z.string() });
/** A date with the salon's opening hours (from its hours lines and closed dates); no hours: closed that date. */
export const OpeningDaySchema = z.object({ date: LocalDateSchema, hours: z.array(OpenSpanSchema) });

/** One day of the salon's book: who works, which chairs exist, and every booking with a sitting that day. */
export const DayViewSchema = z.object({
  date: LocalDateSchema,
  timeZone: z.string(),
  /** The salon's ISO 4217 currency, for the deposits the day shows. */
  currency: z.string(),
  /** The salon's opening hours that date; empty when it is closed. */
  hours: z.array(OpenSpanSchema),
  stylists: z.array(StaffSummarySchema),
  chairs: z.array(ChairSummarySchema),
  bookings: z.array(BookingViewSchema),
});
export type DayView = z.infer<typeof DayViewSchema>;
export const DayQuerySchema = z.object({ date: LocalDateSchema.optional() }).strict();

export const WeekQuerySchema = z.object({ date: LocalDateSchema.optional(), stylistId: IdSchema.optional() }).strict();
/** Seven days from `from` (the Monday of the asked date's week) to `to` (the next Monday, exclusive), one stylist or all. */
export const WeekViewSchema = z.object({
  from: LocalDateSchema,
  to: LocalDateSchema,
  timeZone: z.string(),
  /** Each of the seven dates with the salon's opening hours (none: closed). */
  days: z.array(OpeningDaySchema),
  stylists: z.array(StaffSummarySchema),
  bookings: z.array(BookingViewSchema),
});
export type WeekView = z.infer<typeof WeekViewSchema>;

export const MyBookingsSchema = z.object({ timeZone: z.string(), bookings: z.array(BookingViewSchema) });
export type MyBookings = z.infer<typeof MyBookingsSchema>;
