/**
 * The scenario (input) as zod schemas: shape and types only. Rules that need the time zone or
 * cross-references (grid, gaps, ids, horizon length) are checked in compile-scenario.ts.
 */
import { z } from 'zod';

const id = z.string().min(1);
const localDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'expected a local date YYYY-MM-DD');
const localDateTime = z.string().regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/, 'expected a local date-time YYYY-MM-DDTHH:mm');
const clockTime = z.string().regex(/^\d{2}:\d{2}$/, 'expected a local time HH:mm');
const positiveMinutes = z.number().int().positive();

export const HoursRuleSchema = z.strictObject({ rrule: z.string().min(1), start: clockTime, end: clockTime });
export const PeriodSchema = z.strictObject({ start: localDateTime, end: localDateTime });

/** A chair or basin; out-of-service periods count as taken for planning (not for occupancy). */
export const UnitSchema = z.strictObject({ id, outOfService: z.array(PeriodSchema).default([]) });

export const StylistSchema = z.strictObject({
  id,
  skills: z.array(z.string()).default([]),
  maxClientsAtOnce: z.number().int().min(1).default(1),
  hours: z.array(HoursRuleSchema).default([]),
  timeOff: z.array(PeriodSchema).default([]),
});

const stepKindMessage = { message: 'unknown step kind (expected hands_on, developing or basin)' };

export const BookedStepSchema = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('hands_on'), start: localDateTime, end: localDateTime }),
    z.strictObject({ kind: z.literal('developing'), start: localDateTime, end: localDateTime }),
    z.strictObject({ kind: z.literal('basin'), start: localDateTime, end: localDateTime, basin: id }),
  ],
  stepKindMessage,
);

export const BookingSchema = z.strictObject({
  id,
  stylist: id,
  chair: id,
  steps: z.array(BookedStepSchema).min(1),
});

/** The caller's own name for a step (`id`) and its words (`label`): the answer returns both on the planned step. */
const stepTags = { id: id.optional(), label: z.string().optional() };

export const RequestStepSchema = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('hands_on'), minutes: positiveMinutes, ...stepTags }),
    z.strictObject({ kind: z.literal('developing'), minMinutes: positiveMinutes, maxMinutes: positiveMinutes, ...stepTags }),
    z.strictObject({ kind: z.literal('basin'), minutes: positiveMinutes, ...stepTags }),
  ],
  stepKindMessage,
);

/** A stretch of local time a sitting may start in, both ends included. */
export const StartStretchSchema = z.strictObject({ from: localDateTime, to: localDateTime });

export const SittingSchema = z.strictObject({
  daysAfterPrevious: z.strictObject({ min: z.number().int().min(1), max: z.number().int().min(1) }).optional(),
  steps: z.array(RequestStepSchema).min(1),
  /** Where the sitting's first step may start (e.g. what a client's skin test allows); absent: anywhere. */
  allowedStarts: z.array(StartStretchSchema).optional(),
});

export const RequestSchema = z.strictObject({
  skill: z.string().min(1),
  stylist: id.nullable().default(null),
  earliest: localDateTime,
  sittings: z.array(SittingSchema).min(1),
  limit: z.number().int().min(1).max(1000).default(10),
  spread: z.enum(['day', 'none']).default('day'),
});

export const FitSchema = z.strictObject({ service: z.string().min(1), skill: z.string().min(1), minutes: positiveMinutes });

export const ScenarioSchema = z.strictObject({
  timeZone: z.string().min(1),
  granularityMinutes: z.number().int().min(1).max(60),
  horizon: z.strictObject({ from: localDate, to: localDate }),
  salonHours: z.array(HoursRuleSchema),
  stylists: z.array(StylistSchema),
  chairs: z.array(UnitSchema),
  basins: z.array(UnitSchema).default([]),
  bookings: z.array(BookingSchema).default([]),
  request: RequestSchema.optional(),
  fits: z.array(FitSchema).default([]),
});

/** A scenario as the engine takes it (defaults filled in). */
export type Scenario = z.output<typeof ScenarioSchema>;
/** A scenario as written in JSON (optional fields may be left out). */
export type ScenarioInput = z.input<typeof ScenarioSchema>;
export type Booking = z.output<typeof BookingSchema>;
export type BookedStep = z.output<typeof BookedStepSchema>;
export type ServiceRequest = z.output<typeof RequestSchema>;
export type RequestStep = z.output<typeof RequestStepSchema>;
export type HoursRule = z.output<typeof HoursRuleSchema>;
export type StartStretch = z.output<typeof StartStretchSchema>;
