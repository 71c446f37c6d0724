import { z } from 'zod';
import { InstantSchema, LocalDateSchema, typedText } from './common.schemas';

/** Money in and back per method on one salon day, in the currency's minor unit. */
const MethodTotalsSchema = z.object({ inCents: z.number().int(), refundedCents: z.number().int(), netCents: z.number().int() });

/** The day's close as the desk made it: cash counted against cash expected, the difference, who and when. */
export const DayCloseSchema = z.object({
  expectedCashCents: z.number().int(),
  countedCashCents: z.number().int(),
  /** Counted minus expected: below zero the drawer is short, above it is over. */
  differenceCents: z.number().int(),
  note: z.string(),
  closedBy: z.string().nullable(),
  closedAt: InstantSchema,
  reopenedBy: z.string().nullable(),
  reopenedAt: InstantSchema.nullable(),
});

/** One salon day's takings (docs/money.md, "Takings"): every figure from the payments recorded that day. */
export const TakingsSchema = z.object({
  date: LocalDateSchema,
  timeZone: z.string(),
  currency: z.string(),
  byMethod: z.object({ card: MethodTotalsSchema, cash: MethodTotalsSchema }),
  deposits: z.object({ takenCents: z.number().int(), appliedCents: z.number().int(), refundedCents: z.number().int() }),
  balancesCents: z.number().int(),
  refundsCents: z.number().int(),
  tipsCents: z.number().int(),
  tipsByStylist: z.array(z.object({ stylistId: z.string().nullable(), name: z.string(), tipsCents: z.number().int() })),
  /** Every movement counted, for the CSV. */
  movements: z.array(
    z.object({
      at: InstantSchema,
      kind: z.enum(['deposit', 'balance', 'tip', 'refund']),
      method: z.enum(['card', 'cash']),
      /** Money in is positive, a refund negative. */
      amountCents: z.number().int(),
      clientName: z.string().nullable(),
      stylistName: z.string().nullable(),
      note: z.string(),
    }),
  ),
  /** Cash that should be in the drawer from the day's payments (cash in less cash refunded; the float is not counted). */
  expectedCashCents: z.number().int(),
  /** The close that stands for this day, or null while it is open. */
  close: DayCloseSchema.nullable(),
  /** Earlier closes the owner reopened, newest first. */
  reopened: z.array(DayCloseSchema),
});
export type Takings = z.infer<typeof TakingsSchema>;

export const TakingsQuerySchema = z.object({ date: LocalDateSchema }).strict();
export const CloseDayBodySchema = z
  .object({
    date: LocalDateSchema,
    countedCashCents: z.number().int().min(0, 'Count zero or more').max(100_000_000),
    note: typedText(300).trim().default(''),
  })
  .strict();
export const ReopenDayBodySchema = z.object({ date: LocalDateSchema }).strict();
