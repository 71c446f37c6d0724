import { z } from 'zod';
import { BookingStatusSchema, IdSchema, InstantSchema, StepKindSchema, typedText } from './common.schemas';
import { ProductFamilySchema } from './step-plan.schemas';
import { ReplanSummarySchema } from './replan.schemas';

/** Where one sitting stands on the day (docs/glossary.md, "Sitting statuses"). */
export const SittingStatusSchema = z.enum(['booked', 'arrived', 'in_progress', 'finished', 'no_show']);
export type SittingStatus = z.infer<typeof SittingStatusSchema>;

/** The taps that change a sitting; each can be undone for a minute except a no-show (its message has gone out). */
export const TapActionSchema = z.enum(['arrive', 'no_show', 'start', 'finish', 'finish_sitting']);
export type TapAction = z.infer<typeof TapActionSchema>;

const count = (what: string) => z.string().regex(/^[1-9]\d?$/, `A ${what} number from 1`);

/** `/api/bookings/:id/sittings/:n/…`: the booking and its sitting, counted from 1. */
export const SittingParamsSchema = z.object({ id: IdSchema, n: count('sitting') }).strict();
/** `/api/bookings/:id/sittings/:n/steps/:k/…`: one step of the sitting, counted from 1. */
export const StepParamsSchema = z.object({ id: IdSchema, n: count('sitting'), k: count('step') }).strict();

/** Finishing a sitting whose steps are not all finished: said on purpose, with the reason kept. */
export const FinishSittingSchema = z
  .object({
    leaveOpen: z.boolean(),
    reason: typedText(300).optional(),
  })
  .strict();

/** One step as planned and as it went. */
export const RunStepSchema = z.object({
  seq: z.number().int(),
  kind: StepKindSchema,
  label: z.string(),
  product: ProductFamilySchema,
  plannedStart: InstantSchema,
  plannedEnd: InstantSchema,
  actualStart: InstantSchema.nullable(),
  actualEnd: InstantSchema.nullable(),
  /** For developing steps: the least and most minutes from the booked step plan. */
  minMinutes: z.number().int().nullable(),
  maxMinutes: z.number().int().nullable(),
});

/**
 * A sitting as the day has run it: its status, arrival, and each step planned and actual. The answer of every tap
 * (arrive, no-show, start, finish, undo). It is an object beside the booking so a later re-plan can add what the
 * change means for the rest of the day (conflicts) without changing these fields.
 */
export const SittingRunSchema = z.object({
  booking: z.object({ id: IdSchema, status: BookingStatusSchema }),
  sitting: z.object({
    seq: z.number().int(),
    of: z.number().int(),
    status: SittingStatusSchema,
    plannedStart: InstantSchema,
    plannedEnd: InstantSchema,
    arrivedAt: InstantSchema.nullable(),
    lateMinutes: z.number().int().nullable(),
    leftOpenReason: z.string().nullable(),
    steps: z.array(RunStepSchema),
  }),
  /** The tap just made and until when it can be undone; null after an undo or a no-show. */
  undo: z.object({ action: TapActionSchema, until: InstantSchema }).nullable(),
});
export type SittingRun = z.infer<typeof SittingRunSchema>;

/** The answer of a tap that sets an actual time (start, finish, finish sitting, undo): the sitting, and what it means for the stylist's day. */
export const SteppedSittingRunSchema = SittingRunSchema.extend({ replan: ReplanSummarySchema });
export type SteppedSittingRun = z.infer<typeof SteppedSittingRunSchema>;
