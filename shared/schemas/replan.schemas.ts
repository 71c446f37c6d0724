import { z } from 'zod';
import { IdSchema, InstantSchema, LocalDateSchema } from './common.schemas';

/**
 * A stylist's day re-planned from the actual step times, as the server answers it: the conflicts an overrun makes
 * for later bookings, each with fixes best first, and the minutes an early finish frees. docs/glossary.md names them.
 */

/** What a conflict is about: the stylist's hands, their client cap, a chair, a basin, their working hours, closing time. */
export const ConflictKindSchema = z.enum(['hands', 'clients', 'chair', 'basin', 'hours', 'closing']);
export type ConflictKind = z.infer<typeof ConflictKindSchema>;

// Each fix names the sitting it changes; a step by its id, never by its place in a list.
const developingFix = z.strictObject({
  kind: z.literal('developing'),
  sittingId: IdSchema,
  stepId: IdSchema,
  /** The developing step's new length, within its least and most time. */
  minutes: z.number().int().positive().max(720),
});
const chairFix = z.strictObject({ kind: z.literal('chair'), sittingId: IdSchema, chairId: IdSchema });
const basinFix = z.strictObject({ kind: z.literal('basin'), sittingId: IdSchema, stepId: IdSchema, basinId: IdSchema });
const handOverFix = z.strictObject({ kind: z.literal('hand_over'), sittingId: IdSchema, stylistId: IdSchema });
const lateStartFix = z.strictObject({
  kind: z.literal('late_start'),
  sittingId: IdSchema,
  minutesLate: z.number().int().positive().max(240),
  /** The sitting's new start (its booked start plus minutesLate). */
  start: InstantSchema,
});
const anotherDayFix = z.strictObject({ kind: z.literal('another_day'), sittingId: IdSchema });

/** A fix as the re-plan offers it. */
export const ReplanFixSchema = z.discriminatedUnion('kind', [developingFix, chairFix, basinFix, handOverFix, lateStartFix, anotherDayFix]);
export type ReplanFix = z.infer<typeof ReplanFixSchema>;

/** A fix the desk applies with one action (another day is picked in the move form, from the engine's free times). */
export const ApplyFixSchema = z.strictObject({
  fix: z.discriminatedUnion('kind', [developingFix, chairFix, basinFix, handOverFix, lateStartFix]),
});
export type ApplicableFix = z.infer<typeof ApplyFixSchema>['fix'];

/** A sitting a conflict names: whose, when (as booked), with whom. */
export const ConflictSittingSchema = z.object({
  bookingId: IdSchema,
  sittingId: IdSchema,
  seq: z.number().int(),
  clientName: z.string(),
  stylistName: z.string(),
  start: InstantSchema,
});

export const FixViewSchema = z.object({
  /** The booking the fix changes (the path of POST /api/bookings/:id/replan-fix). */
  bookingId: IdSchema,
  fix: ReplanFixSchema,
  /** The fix in plain words, e.g. "Start Jo Park 15 min late, at 3:15 PM, and tell them". */
  words: z.string(),
});
export type FixView = z.infer<typeof FixViewSchema>;

export const ConflictViewSchema = z.object({
  kind: ConflictKindSchema,
  /** The stylist whose day was re-planned (the one running late). */
  stylistId: IdSchema,
  /** The booking that suffers: the later one; for hours and closing, the running sitting itself. */
  sitting: ConflictSittingSchema,
  /** The running sitting that causes it (null for hours and closing). */
  cause: ConflictSittingSchema.nullable(),
  minutes: z.number().int(),
  start: InstantSchema,
  end: InstantSchema,
  /** What happens, in plain words. */
  words: z.string(),
  /** Feasible fixes, best first. */
  fixes: z.array(FixViewSchema),
  /** The delay the later client would be told of ("Tell the client"), or null when it is not a later client's wait. */
  tellMinutes: z.number().int().nullable(),
  /** The delays this sitting's client has been told of already, and when. */
  told: z.array(z.object({ minutesLate: z.number().int(), at: InstantSchema })),
});
export type ConflictView = z.infer<typeof ConflictViewSchema>;

/** Minutes of a stylist's hands freed as the day now runs (an early finish, a sitting that moved), from now on; shown as a hands-free window. */
export const FreedStretchSchema = z.object({ stylistId: IdSchema, start: InstantSchema, end: InstantSchema, minutes: z.number().int() });
export type FreedStretch = z.infer<typeof FreedStretchSchema>;

/** What a change of actual times means for the rest of the day (beside the sitting in a tap's answer). */
export const ReplanSummarySchema = z.object({ conflicts: z.array(ConflictViewSchema), freed: z.array(FreedStretchSchema) });
export type ReplanSummary = z.infer<typeof ReplanSummarySchema>;

export const DayConflictsQuerySchema = z.object({ date: LocalDateSchema.optional() }).strict();

/**
 * When the re-plan next changes with the clock alone: a minute after the earliest expected end of a step under way,
 * when a step that simply runs on (nobody taps) starts to push the rest of the day. Null when no step is under way.
 */
const RecheckAtSchema = InstantSchema.nullable();

/** The desk's "Running late" panel: every stylist's day re-planned from the actual times (today only; other days are as booked). */
export const DayConflictsSchema = ReplanSummarySchema.extend({
  date: LocalDateSchema,
  timeZone: z.string(),
  /** The moment of the re-plan. */
  asOf: InstantSchema,
  recheckAt: RecheckAtSchema,
});
export type DayConflicts = z.infer<typeof DayConflictsSchema>;

/** A fix applied: what was done, in words, and the day's conflicts afterwards. */
export const FixAppliedSchema = z.object({ done: z.string(), day: DayConflictsSchema });
export type FixApplied = z.infer<typeof FixAppliedSchema>;

/** "Tell the client": the delay, as the conflict shows it. */
export const TellRunningLateSchema = z.strictObject({ minutesLate: z.number().int().positive().max(240) });
export const RunningLateToldSchema = z.object({
  /** False when this client was already told of this delay (then nothing more is sent). */
  sent: z.boolean(),
  words: z.string(),
});
export type RunningLateTold = z.infer<typeof RunningLateToldSchema>;

/** One sitting of the stylist's day as it now runs: each step's start and end in the re-plan, in the book's order (step 1 first). */
export const DayRunSittingViewSchema = z.object({
  bookingId: IdSchema,
  seq: z.number().int(),
  /** Some time differs from the booked one. */
  moved: z.boolean(),
  steps: z.array(z.object({ start: InstantSchema, end: InstantSchema, state: z.enum(['finished', 'running', 'planned']) })),
});
export type DayRunSittingView = z.infer<typeof DayRunSittingViewSchema>;

/** The signed-in stylist's day re-planned from the actual times (today; other days run as booked, so no sittings): My day's times. */
export const StylistDayRunSchema = z.object({
  date: LocalDateSchema,
  timeZone: z.string(),
  asOf: InstantSchema,
  recheckAt: RecheckAtSchema,
  /** The sittings not finished yet. */
  sittings: z.array(DayRunSittingViewSchema),
});
export type StylistDayRun = z.infer<typeof StylistDayRunSchema>;
