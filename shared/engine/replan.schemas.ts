/**
 * The ask for re-planning one stylist's day from the actual times (input of `replanDay`), as zod schemas.
 * Rules that need the scenario (which booking, which step, the zone) are checked in replan-day.ts.
 */
import { z } from 'zod';

const id = z.string().min(1);
const localDateTime = z.string().regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}$/, 'expected a local date-time YYYY-MM-DDTHH:mm');
const positiveMinutes = z.number().int().positive();

/**
 * What the chair knows about one booked step: when it really started and, once finished, ended (any minute, not only
 * the grid), its developing range, and the caller's own id and label (returned on the re-planned step).
 * A developing step without `minMinutes`/`maxMinutes` keeps its booked length (no flexibility).
 */
export const ActualStepSchema = z.strictObject({
  /** Index of the step in the scenario booking's `steps`, from 0. */
  step: z.number().int().min(0),
  actualStart: localDateTime.optional(),
  actualEnd: localDateTime.optional(),
  minMinutes: positiveMinutes.optional(),
  maxMinutes: positiveMinutes.optional(),
  id: id.optional(),
  label: z.string().optional(),
});

export const ActualSittingSchema = z.strictObject({
  /** The scenario booking (one sitting). */
  booking: id,
  /** The service's skill, so the sitting may be handed to another stylist who has it (absent: no hand-over offered). */
  skill: z.string().min(1).optional(),
  steps: z.array(ActualStepSchema).default([]),
});

export const ReplanAskSchema = z.strictObject({
  stylist: id,
  /** The moment of the re-plan, salon local time; its local date is the day re-planned. */
  now: localDateTime,
  sittings: z.array(ActualSittingSchema).default([]),
  /** How late a later client may be asked to start (a salon setting; 15 minutes is common practice). */
  lateStartLimitMinutes: z.number().int().min(0).max(240).default(15),
});

export type ReplanAsk = z.output<typeof ReplanAskSchema>;
export type ReplanAskInput = z.input<typeof ReplanAskSchema>;
