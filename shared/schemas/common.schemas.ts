import { z } from 'zod';

/** A local calendar date, `YYYY-MM-DD`. */
export const LocalDateSchema = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2027-03-14');
/** An instant as ISO 8601 with its UTC offset (what the API sends for every time). */
export const InstantSchema = z.string();
export const IdSchema = z.uuid();
export const IdParamsSchema = z.object({ id: IdSchema }).strict();
export const RoleSchema = z.enum(['client', 'front_desk', 'stylist', 'owner']);
export type Role = z.infer<typeof RoleSchema>;
export const StepKindSchema = z.enum(['hands_on', 'developing', 'basin']);
export type StepKind = z.infer<typeof StepKindSchema>;
export const BookingStatusSchema = z.enum(['held', 'booked', 'checked_in', 'finished', 'cancelled', 'no_show']);
export type BookingStatus = z.infer<typeof BookingStatusSchema>;
