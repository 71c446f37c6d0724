import { z } from 'zod';

/**
 * True when a string that starts `YYYY-MM-DD` (optionally `THH:mm`) names a day that exists and a time
 * on the 24-hour clock. The patterns alone let 2027-02-30 or 25:61 through, and Date.parse rolls
 * 2027-02-30 over into March instead of refusing it.
 */
export function isRealDateTime(s: string): boolean {
  const match = /^(\d{4})-(\d{2})-(\d{2})(?:T(\d{2}):(\d{2}))?/.exec(s);
  if (!match) return false;
  const [y = 0, m = 0, d = 0, hh = 0, mm = 0] = match.slice(1).map((v) => Number(v ?? 0));
  const date = new Date(0);
  date.setUTCFullYear(y, m - 1, d); // not Date.UTC, which reads years 0–99 as 1900–1999
  return date.getUTCFullYear() === y && date.getUTCMonth() === m - 1 && date.getUTCDate() === d && hh <= 23 && mm <= 59;
}

// A NUL byte (PostgreSQL text cannot hold one) or half of a surrogate pair (not Unicode; it would be stored
// as a replacement character, not as typed).
// eslint-disable-next-line no-control-regex -- NUL is the character this looks for
export const UNSTORABLE = /\u0000|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;
export const UNSTORABLE_MESSAGE = 'Contains a character that cannot be stored (a NUL byte or half of an emoji)';

/** Free text a person types, at most `max` characters, refused (naming the field) when it cannot be stored as typed. */
export const typedText = (max: number) =>
  z
    .string()
    .max(max, `At most ${max} characters`)
    .refine((s) => !UNSTORABLE.test(s), UNSTORABLE_MESSAGE);

/**
 * The dates the API accepts, first and last: what PostgreSQL's date and timestamptz, JavaScript's Date and the
 * engine's time-zone tables all hold with room to spare (a week or a three-week search past the last date still
 * fits), and wider than any booking, birth date or report needs. A year 0 or 10000 is refused here, naming the
 * field, instead of failing deep in a query.
 */
export const DATE_RANGE = { first: '1900-01-01', last: '2199-12-31' } as const;
/** True when a `YYYY-MM-DD…` string's calendar date lies within DATE_RANGE (ISO dates order as text). */
export const isWithinDateRange = (s: string) => s.slice(0, 10) >= DATE_RANGE.first && s.slice(0, 10) <= DATE_RANGE.last;
const OUT_OF_RANGE = `Use a date between ${DATE_RANGE.first} and ${DATE_RANGE.last}`;

/** A local calendar date, `YYYY-MM-DD`, within DATE_RANGE. */
export const LocalDateSchema = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Use a date like 2027-03-14')
  .refine(isRealDateTime, 'Not a real date')
  .refine(isWithinDateRange, OUT_OF_RANGE);
/** An instant as ISO 8601 with its UTC offset (what the API sends for every time). */
export const InstantSchema = z.string();
/** An instant sent to the API: ISO 8601 with a UTC offset or Z, to the minute or finer (as the API answers them), within DATE_RANGE. */
export const InstantInputSchema = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d{1,3})?)?(Z|[+-]\d{2}:\d{2})$/, 'Use a time like 2027-03-14T09:30-06:00')
  .refine((s) => isRealDateTime(s) && !Number.isNaN(Date.parse(s)), 'Not a real date and time')
  .refine(isWithinDateRange, OUT_OF_RANGE);
export const IdSchema = z.uuid();
export const IdParamsSchema = z.object({ id: IdSchema }).strict();
export const RoleSchema = z.enum(['client', 'front_desk', 'stylist', 'owner']);
export type Role = z.infer<typeof RoleSchema>;
export const StepKindSchema = z.enum(['hands_on', 'developing', 'basin']);
export type StepKind = z.infer<typeof StepKindSchema>;
export const BookingStatusSchema = z.enum(['held', 'booked', 'checked_in', 'finished', 'checked_out', 'cancelled', 'no_show']);
export type BookingStatus = z.infer<typeof BookingStatusSchema>;
