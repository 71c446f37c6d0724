import { z } from 'zod';
import { IdSchema, InstantSchema, LocalDateSchema } from './common.schemas';
import { HoursRuleInputSchema } from './hours-rule.schemas';
import { ServiceCategorySchema, ServiceSummarySchema } from './service.schemas';
import { StepPlanSchema } from './step-plan.schemas';

/** A future booking that a set-up change touches (listed before the change is made or refused). */
export const AffectedBookingSchema = z.object({
  id: IdSchema,
  clientName: z.string(),
  serviceName: z.string(),
  stylistId: IdSchema,
  stylistName: z.string(),
  /** Start of the booking's first future sitting. */
  start: InstantSchema,
  /** Stylists who are free for every step of it as it stands (for re-assigning). */
  freeStylists: z.array(z.object({ id: IdSchema, name: z.string() })),
});
export type AffectedBooking = z.infer<typeof AffectedBookingSchema>;
export const AffectedBookingListSchema = z.object({ bookings: z.array(AffectedBookingSchema) });

// ---- Staff ----
export const StaffRoleSchema = z.enum(['stylist', 'front_desk', 'owner']);
export type StaffRole = z.infer<typeof StaffRoleSchema>;

const skillsSchema = z.array(z.string().trim().min(1).max(40)).max(20);

/** What the owner sets for a member of staff; stylist fields apply to people who take clients. */
export const StaffDetailsSchema = z
  .object({
    name: z.string().trim().min(1, 'Enter a name').max(120),
    role: StaffRoleSchema,
    skills: skillsSchema,
    maxClientsAtOnce: z.number({ error: 'Enter a number' }).int().min(1, 'At least 1').max(6, 'At most 6'),
    hours: z.array(HoursRuleInputSchema).max(14),
  })
  .strict()
  .superRefine((s, ctx) => {
    if (s.role !== 'stylist') return;
    if (s.skills.length === 0) ctx.addIssue({ code: 'custom', path: ['skills'], message: 'A stylist needs at least one skill' });
    if (s.hours.length === 0) ctx.addIssue({ code: 'custom', path: ['hours'], message: 'A stylist needs working hours' });
  });
export type StaffDetails = z.infer<typeof StaffDetailsSchema>;

export const StaffInviteSchema = z.object({ email: z.email('Enter an e-mail address').trim().toLowerCase().max(200), details: StaffDetailsSchema }).strict();
export type StaffInvite = z.infer<typeof StaffInviteSchema>;

const lastNotBeforeFirst = { message: 'The last day must not be before the first', path: ['to'] };
export const TimeOffInputSchema = z
  .object({ from: LocalDateSchema, to: LocalDateSchema, reason: z.string().trim().max(200) })
  .strict()
  .refine((t) => t.to >= t.from, lastNotBeforeFirst);
export type TimeOffInput = z.infer<typeof TimeOffInputSchema>;

export const StaffMemberSchema = z.object({
  id: IdSchema,
  /** The staff row of someone who takes clients; null for desk and owner accounts without one. */
  staffId: IdSchema.nullable(),
  email: z.string(),
  active: z.boolean(),
  /** Invited and has not chosen a password yet. */
  invited: z.boolean(),
  details: z.object({
    name: z.string(),
    role: StaffRoleSchema,
    skills: z.array(z.string()),
    maxClientsAtOnce: z.number().int(),
    hours: z.array(z.object({ rrule: z.string(), start: z.string(), end: z.string() })),
  }),
  timeOff: z.array(z.object({ id: IdSchema, start: InstantSchema, end: InstantSchema, reason: z.string() })),
  futureBookings: z.number().int(),
});
export type StaffMember = z.infer<typeof StaffMemberSchema>;
export const StaffListSchema = z.object({ staff: z.array(StaffMemberSchema) });

export const ReassignSchema = z.object({ bookingId: IdSchema, toStaffId: IdSchema }).strict();

// ---- Chairs and basins ----
export const UnitKindSchema = z.enum(['chairs', 'basins']);
export type UnitKind = z.infer<typeof UnitKindSchema>;
export const UnitNameSchema = z.object({ name: z.string().trim().min(1, 'Enter a name').max(60) }).strict();
export const UnitParamsSchema = z.object({ kind: UnitKindSchema, id: IdSchema }).strict();
export const UnitKindParamsSchema = z.object({ kind: UnitKindSchema }).strict();

export const OutOfServiceInputSchema = z
  .object({ from: LocalDateSchema, to: LocalDateSchema, reason: z.string().trim().max(200) })
  .strict()
  .refine((t) => t.to >= t.from, lastNotBeforeFirst);
/** Whole days, first and last included (query of the affected-bookings preview). */
export const DayPeriodQuerySchema = z
  .object({ from: LocalDateSchema, to: LocalDateSchema })
  .strict()
  .refine((t) => t.to >= t.from, lastNotBeforeFirst);
export type OutOfServiceInput = z.infer<typeof OutOfServiceInputSchema>;

export const UnitSchema = z.object({
  id: IdSchema,
  name: z.string(),
  outOfService: z.array(z.object({ id: IdSchema, start: InstantSchema, end: InstantSchema, reason: z.string() })),
});
export type Unit = z.infer<typeof UnitSchema>;
export const UnitListSchema = z.object({ chairs: z.array(UnitSchema), basins: z.array(UnitSchema) });

// ---- Services ----
export const ServiceInputSchema = z
  .object({
    name: z.string().trim().min(1, 'Enter a name').max(120),
    description: z.string().trim().max(1000),
    category: ServiceCategorySchema,
    skill: z.string().trim().min(1, 'Say which skill it needs').max(40),
    priceCents: z.number({ error: 'Enter a price' }).int().min(0, 'The price cannot be negative').max(10_000_000),
    priceIsFrom: z.boolean(),
    onlineBookable: z.boolean(),
    needsSkinTest: z.boolean(),
    depositKind: z.enum(['fixed', 'percent']),
    /** Used when the deposit is fixed; 0 means no deposit. */
    depositCents: z.number({ error: 'Enter an amount' }).int().min(0, 'The deposit cannot be negative'),
    /** Used when the deposit is a share of the price. */
    depositPercent: z.number({ error: 'Enter a percentage' }).gt(0, 'More than 0').max(100, 'At most 100 %').nullable(),
    stepPlan: StepPlanSchema,
  })
  .strict()
  .superRefine((s, ctx) => {
    if (s.depositKind === 'percent' && s.depositPercent === null) ctx.addIssue({ code: 'custom', path: ['depositPercent'], message: 'Enter a percentage' });
    if (s.depositKind === 'fixed' && s.depositCents > s.priceCents)
      ctx.addIssue({ code: 'custom', path: ['depositCents'], message: 'The deposit cannot be more than the price' });
  });
export type ServiceInput = z.infer<typeof ServiceInputSchema>;
export type ServiceFormInput = z.input<typeof ServiceInputSchema>;

export const SetupServiceSchema = ServiceSummarySchema.extend({
  active: z.boolean(),
  depositPercent: z.number().nullable(),
  futureBookings: z.number().int(),
});
export type SetupService = z.infer<typeof SetupServiceSchema>;
export const SetupServiceListSchema = z.object({ services: z.array(SetupServiceSchema), skills: z.array(z.string()) });
