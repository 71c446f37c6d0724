import type { FormatContext } from './locale';
import { plainSpaces } from './plain-spaces';

/*
 * Dwell's one policy for dates and times (docs/architecture.md, "Formats"). Intl supplies the words in
 * the salon's locale (weekday and month names, digits, AM/PM); the policy fixes the order and the joins:
 *   date        "Tuesday 8 June 2027" (long) · "Tue 8 Jun 2027" (short): weekday, day, month, year
 *   time        "3:00 PM", with the zone's short name when asked ("3:00 PM MDT")
 *   date + time "Tuesday 8 June 2027 at 3:00 PM" (long) · "Tue 8 Jun 2027, 3:00 PM" (short)
 *   range       "9:00 AM – 2:10 PM", or "Tue 1 Dec 2026, 9:00 AM – 2:10 PM" with its date
 * Instants are shown in the salon's time zone, never the device's: that is where the chair is.
 */

/** An instant (a Date, or ISO 8601 with its offset), or a calendar date `YYYY-MM-DD`, which has no zone. */
export type DateInput = Date | string;

export type DateOptions = {
  /** 'long' writes the weekday and month in full, 'short' abbreviates them. Default 'long'. */
  width?: 'long' | 'short';
  /** Whether the year is written. Default true. */
  year?: boolean;
};

const CALENDAR_DATE = /^\d{4}-\d{2}-\d{2}$/;

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatter(locale: string, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  const key = `${locale}|${JSON.stringify(options)}`;
  let format = formatters.get(key);
  if (!format) {
    format = new Intl.DateTimeFormat(locale, options);
    formatters.set(key, format);
  }
  return format;
}

/** The moment to format and the zone to read it in: a calendar date is noon UTC read in UTC, so it never shifts. */
function moment(value: DateInput, timeZone: string): { at: Date; timeZone: string } {
  if (typeof value === 'string' && CALENDAR_DATE.test(value)) return { at: new Date(`${value}T12:00:00Z`), timeZone: 'UTC' };
  return { at: typeof value === 'string' ? new Date(value) : value, timeZone };
}

const valid = (d: Date) => !Number.isNaN(d.getTime());

/** "Tuesday 8 June 2027", "Tue 8 Jun", …: the date of an instant in the salon's zone, or of a calendar date. */
export function formatDate(value: DateInput, ctx: FormatContext, { width = 'long', year = true }: DateOptions = {}): string {
  const { at, timeZone } = moment(value, ctx.timeZone);
  if (!valid(at)) return '';
  const parts = formatter(ctx.locale, { timeZone, weekday: width, day: 'numeric', month: width, ...(year ? { year: 'numeric' } : {}) }).formatToParts(at);
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value;
  return [part('weekday'), part('day'), part('month'), year ? part('year') : undefined].filter(Boolean).join(' ');
}

/** "3:00 PM" (or "3:00 PM MDT" with `zoneName`) for an instant, on the salon's clock. */
export function formatTime(value: Date | string, ctx: FormatContext, { zoneName = false }: { zoneName?: boolean } = {}): string {
  const at = typeof value === 'string' ? new Date(value) : value;
  if (!valid(at)) return '';
  return plainSpaces(
    formatter(ctx.locale, { timeZone: ctx.timeZone, hour: 'numeric', minute: '2-digit', ...(zoneName ? { timeZoneName: 'short' } : {}) }).format(at),
  );
}

/** "Tuesday 8 June 2027 at 3:00 PM MDT" (long, for messages) or "Tue 8 Jun 2027, 3:00 PM" (short). */
export function formatDateTime(value: Date | string, ctx: FormatContext, options: DateOptions & { zoneName?: boolean } = {}): string {
  const join = (options.width ?? 'long') === 'long' ? ' at ' : ', ';
  return `${formatDate(value, ctx, options)}${join}${formatTime(value, ctx, options)}`;
}

/** "9:00 AM – 2:10 PM"; with `date`, that date first: "Tue 1 Dec 2026, 9:00 AM – 2:10 PM". */
export function formatRange(start: Date | string, end: Date | string, ctx: FormatContext, { date }: { date?: DateOptions } = {}): string {
  const times = `${formatTime(start, ctx)} – ${formatTime(end, ctx)}`;
  return date ? `${formatDate(start, ctx, date)}, ${times}` : times;
}

/** "9:00 PM" (or "9 PM" with `hourOnly`) for a wall-clock time `HH:mm`, e.g. a salon setting: no date, no zone. */
export function formatClock(hhmm: string, { locale }: Pick<FormatContext, 'locale'>, { hourOnly = false }: { hourOnly?: boolean } = {}): string {
  const at = new Date(`2000-01-01T${hhmm}:00Z`);
  if (!valid(at)) return '';
  return plainSpaces(formatter(locale, { timeZone: 'UTC', hour: 'numeric', ...(hourOnly ? {} : { minute: '2-digit' }) }).format(at));
}

/** "45 min", "2 h", "7 h 30 min": a length of time in whole minutes. */
export function formatDuration(totalMinutes: number): string {
  const hours = Math.floor(totalMinutes / 60);
  const minutes = totalMinutes % 60;
  if (hours === 0) return `${minutes} min`;
  return minutes === 0 ? `${hours} h` : `${hours} h ${minutes} min`;
}

/**
 * "Mountain Standard Time (Denver)": the zone's everyday name on a date (its daylight-saving name in summer) and the
 * city it is named for, in place of the time-zone database's id. `on` is a calendar date or an instant; default now.
 */
export function formatZone({ locale, timeZone }: FormatContext, on: DateInput = new Date()): string {
  const at = typeof on === 'string' && CALENDAR_DATE.test(on) ? new Date(`${on}T12:00:00Z`) : typeof on === 'string' ? new Date(on) : on;
  let name: string | undefined;
  try {
    name = formatter(locale, { timeZone, timeZoneName: 'long' })
      .formatToParts(valid(at) ? at : new Date())
      .find((p) => p.type === 'timeZoneName')?.value;
  } catch {
    return timeZone; // not a zone Intl knows: shown as stored
  }
  const city = timeZone.split('/').at(-1)?.replace(/_/g, ' ');
  return name && city && city !== timeZone ? `${name} (${city})` : (name ?? timeZone);
}
