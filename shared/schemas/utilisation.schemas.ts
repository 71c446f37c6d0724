import { DateTime } from 'luxon';
import { z } from 'zod';
import { IdSchema, LocalDateSchema } from './common.schemas';

/** Longest custom period the utilisation figures cover. */
export const MAX_PERIOD_YEARS = 2;

export const PeriodKindSchema = z.enum(['day', 'week', 'month', 'custom']);
export type PeriodKind = z.infer<typeof PeriodKindSchema>;

const realDate = (s: string) => DateTime.fromISO(s, { zone: 'UTC' }).isValid;

/**
 * Which period to measure. `day`, `week` (Monday to Sunday) and `month` are the ones holding `date`
 * (today in salon time when left out); `custom` runs from `from` to `to`, both days included.
 */
export const UtilisationQuerySchema = z
  .object({
    period: PeriodKindSchema.default('week'),
    date: LocalDateSchema.optional(),
    from: LocalDateSchema.optional(),
    to: LocalDateSchema.optional(),
  })
  .strict()
  .superRefine((q, ctx) => {
    for (const field of ['date', 'from', 'to'] as const) {
      const value = q[field];
      if (value && !realDate(value)) ctx.addIssue({ code: 'custom', path: [field], message: `${value} is not a calendar date` });
    }
    if (q.period !== 'custom') return;
    if (!q.from) ctx.addIssue({ code: 'custom', path: ['from'], message: 'Pick the first day of the period' });
    if (!q.to) ctx.addIssue({ code: 'custom', path: ['to'], message: 'Pick the last day of the period' });
    if (!q.from || !q.to || !realDate(q.from) || !realDate(q.to)) return;
    if (q.to < q.from) ctx.addIssue({ code: 'custom', path: ['to'], message: 'The last day must not be before the first day' });
    const limit = DateTime.fromISO(q.from, { zone: 'UTC' }).plus({ years: MAX_PERIOD_YEARS }).toISODate()!;
    if (q.to >= limit)
      ctx.addIssue({ code: 'custom', path: ['to'], message: `A period may be at most ${MAX_PERIOD_YEARS} years long (last day before ${limit})` });
  });
export type UtilisationQuery = z.input<typeof UtilisationQuerySchema>;

/** A share from 0 to 1, or null where its denominator is 0 (e.g. no open minutes). */
const ShareSchema = z.number().nullable();

export const UtilisationPeriodSchema = z.object({
  kind: PeriodKindSchema,
  /** Local dates in salon time: `from` inclusive, `to` exclusive. */
  from: LocalDateSchema,
  to: LocalDateSchema,
  days: z.number().int(),
  /** How many engine scenarios the period was measured in (at most 120 days each). */
  scenarios: z.number().int(),
});

export const HeatCellSchema = z.object({
  /** ISO weekday, 1 = Monday … 7 = Sunday. */
  weekday: z.number().int().min(1).max(7),
  hour: z.number().int().min(0).max(23),
  chairOccupancy: ShareSchema,
  chairHeldMinutes: z.number(),
  chairOpenMinutes: z.number(),
});
export type HeatCell = z.infer<typeof HeatCellSchema>;

export const AttendanceSchema = z.object({
  /** Bookings whose first sitting starts in the period (holds left out). */
  bookings: z.number().int(),
  noShows: z.number().int(),
  /** No-shows ÷ bookings that were not cancelled. */
  noShowRate: ShareSchema,
  cancelled: z.number().int(),
  lateCancels: z.number().int(),
  /** Late cancellations ÷ bookings. */
  lateCancelRate: ShareSchema,
});

const WeekBaseSchema = z.object({
  /** Local dates: the Monday (or the period's first day) and the day after the week's last day in the period. */
  from: LocalDateSchema,
  to: LocalDateSchema,
  bookings: z.number().int(),
  chairOccupancy: ShareSchema,
  windowUse: ShareSchema,
});

const ServiceBaseSchema = z.object({
  serviceId: IdSchema,
  name: z.string(),
  /** Minutes clients of this service held a chair, over sittings starting in the period. */
  chairMinutes: z.number(),
  sittings: z.number().int(),
});

/** A sitting counts as on time when its first step started no later than this many minutes after its planned start. */
export const ON_TIME_MINUTES = 5;

/**
 * Plan against actual over the period's finished sittings with tapped step times (docs/utilisation.md): how many
 * started on time, how far they ran over their planned length, and their chair time planned and actual.
 */
export const TimekeepingSchema = z.object({
  /** Finished sittings starting in the period whose steps carry actual times. */
  sittings: z.number().int(),
  /** Of those, the ones whose first step started no later than ON_TIME_MINUTES after the plan. */
  onTime: z.number().int(),
  onTimeRate: ShareSchema,
  /** Sittings that started late and whose client had arrived more than ON_TIME_MINUTES late. */
  lateArrivals: z.number().int(),
  /** Minutes the sittings ran longer than planned (first actual start to last actual end, less the planned length); shorter ones count 0. */
  overrunMinutes: z.number(),
  overrunPerSitting: z.number().nullable(),
  plannedChairHours: z.number(),
  actualChairHours: z.number(),
});
export type Timekeeping = z.infer<typeof TimekeepingSchema>;
export const StylistTimekeepingSchema = TimekeepingSchema.extend({ stylistId: IdSchema, name: z.string() });
export type StylistTimekeeping = z.infer<typeof StylistTimekeepingSchema>;

/** What the front desk sees: how full the chairs are and when, no money and no per-person figures. */
export const DeskUtilisationSchema = z.object({
  salon: z.object({ name: z.string(), timeZone: z.string() }),
  period: UtilisationPeriodSchema,
  chairOccupancy: ShareSchema,
  windowUse: ShareSchema,
  attendance: AttendanceSchema,
  heatMap: z.array(HeatCellSchema),
  weeks: z.array(WeekBaseSchema),
  topServices: z.array(ServiceBaseSchema),
  /** The salon's on-time rate, overruns and chair time planned and actual; the owner's adds each stylist. */
  timekeeping: TimekeepingSchema,
});
export type DeskUtilisation = z.infer<typeof DeskUtilisationSchema>;

export const StylistFiguresSchema = z.object({
  stylistId: IdSchema,
  name: z.string(),
  handsOnShare: ShareSchema,
  handsOnMinutes: z.number(),
  onClockMinutes: z.number(),
  bookings: z.number().int(),
  noShows: z.number().int(),
  revenueCents: z.number(),
  /** Revenue ÷ the stylist's hours on the clock. */
  revenuePerHourCents: z.number().nullable(),
});
export type StylistFigures = z.infer<typeof StylistFiguresSchema>;

/** Everything, for the owner. The three engine figures are exactly `npm run plan -- occupancy` on the exported scenario. */
export const OwnerUtilisationSchema = DeskUtilisationSchema.extend({
  salon: z.object({ name: z.string(), timeZone: z.string(), currency: z.string() }),
  /** Per stylist id, as the engine answers it. */
  handsOnShare: z.record(z.string(), ShareSchema),
  money: z.object({
    revenueCents: z.number(),
    chairHours: z.number(),
    stylistHours: z.number(),
    revenuePerChairHourCents: z.number().nullable(),
    revenuePerStylistHourCents: z.number().nullable(),
  }),
  deposits: z.object({
    takenCents: z.number(),
    taken: z.number().int(),
    keptCents: z.number(),
    kept: z.number().int(),
    refundedCents: z.number(),
    refunded: z.number().int(),
  }),
  corrections: z.object({
    count: z.number().int(),
    averageBookedMinutes: z.number().nullable(),
    averageQuotedMinMinutes: z.number().nullable(),
    averageQuotedMaxMinutes: z.number().nullable(),
  }),
  stylists: z.array(StylistFiguresSchema),
  weeks: z.array(WeekBaseSchema.extend({ handsOnShare: ShareSchema, revenueCents: z.number() })),
  topServices: z.array(ServiceBaseSchema.extend({ revenueCents: z.number() })),
  timekeeping: TimekeepingSchema.extend({ stylists: z.array(StylistTimekeepingSchema) }),
});
export type OwnerUtilisation = z.infer<typeof OwnerUtilisationSchema>;
