import { bookingStatusLabels, sittingLabel } from '@client/lib/booking-labels';
import { formatDateTime, formatRange } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { formatMoney } from '@shared/money/money';

/** One changed value of an audit entry, as dotted path and its before/after values. */
export type Change = { field: string; before: unknown; after: unknown };

type Flat = Map<string, unknown>;

function flatten(value: unknown, prefix: string, into: Flat): Flat {
  if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
    for (const [key, inner] of Object.entries(value)) flatten(inner, prefix ? `${prefix}.${key}` : key, into);
  } else if (Array.isArray(value) && value.some((v) => v !== null && typeof v === 'object')) {
    value.forEach((inner, i) => flatten(inner, `${prefix}.${i + 1}`, into));
  } else if (prefix) {
    into.set(prefix, value);
  }
  return into;
}

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** What an audit entry changed: only fields whose value differs between before and after, in a stable order. */
export function describeChange(before: unknown, after: unknown): Change[] {
  const was = flatten(before, '', new Map());
  const now = flatten(after, '', new Map());
  const fields = [...new Set([...was.keys(), ...now.keys()])];
  return fields.filter((f) => !same(was.get(f), now.get(f))).map((field) => ({ field, before: was.get(field), after: now.get(field) }));
}

const capitalise = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** "sittings.2.startTime" → "Sitting 2 start time": camelCase split, a numbered list item named in the singular. */
export function fieldLabel(field: string): string {
  const words = field
    .split('.')
    .map((part) => part.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase())
    .join(' ')
    .replace(/\b(\w+)s (\d+)\b/g, '$1 $2');
  return capitalise(words);
}

/** "moved_sitting" or "moved sitting 2" → "Moved sitting 2". */
export function actionLabel(action: string): string {
  return capitalise(action.replace(/_/g, ' '));
}

const INSTANT = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/;

/** A value for a person to read: times in the salon zone, empty as a dash. */
export function valueText(value: unknown, formatInstant: (iso: string) => string): string {
  if (value === undefined || value === null || value === '') return '—';
  if (typeof value === 'string') return INSTANT.test(value) ? formatInstant(value) : value;
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (Array.isArray(value)) return value.map((v) => valueText(v, formatInstant)).join(', ');
  return String(value);
}

/** What a booking's history needs to put stored values in the app's words. */
export type HistoryWords = {
  timeZone: string;
  currency: string;
  /** A stylist's name for an id (entries written before names were recorded); undefined when not known. */
  stylistName: (id: string) => string | undefined;
};

/** One line of a history entry: what, and the value before and after (null where the entry has none). */
export type HistoryLine = { label: string; before: string | null; after: string | null };

type SittingRecord = { sitting?: number; chair?: string; start?: string; end?: string };
type BookingRecord = { status?: string; stylist?: string; deposit?: unknown; sittings?: SittingRecord[] } & Record<string, unknown>;

const ID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

const asRecord = (value: unknown): BookingRecord => (value !== null && typeof value === 'object' && !Array.isArray(value) ? (value as BookingRecord) : {});

/** A sitting as the booking page writes it: "Tue 1 Dec 2026, 9:00 AM – 2:10 PM · Chair 1". */
function sittingText(s: SittingRecord | undefined, zone: string): string | null {
  if (!s?.start) return null;
  const salon = formatFor(zone);
  const when = s.end ? formatRange(s.start, s.end, salon, { date: { width: 'short' } }) : formatDateTime(s.start, salon, { width: 'short' });
  return `${when}${s.chair ? ` · ${s.chair}` : ''}`;
}

/**
 * A booking's audit entry as lines in the words of the rest of the app: statuses by their names, the stylist by
 * name, each sitting as "Sitting 1 of 2" with its day, times (salon time) and chair, a deposit outcome in words and
 * an amount paid in the salon's currency. Anything else falls back to a plain label and value.
 */
export function describeBookingChange(before: unknown, after: unknown, words: HistoryWords): HistoryLine[] {
  const was = asRecord(before);
  const now = asRecord(after);
  const lines: HistoryLine[] = [];
  const push = (label: string, a: string | null, b: string | null) => {
    if (a !== b) lines.push({ label, before: a, after: b });
  };
  const text = <T>(value: T | undefined, show: (v: T) => string) => (value === undefined || value === null ? null : show(value));

  push(
    'Status',
    text(was.status, (s) => bookingStatusLabels[s as keyof typeof bookingStatusLabels] ?? s),
    text(now.status, (s) => bookingStatusLabels[s as keyof typeof bookingStatusLabels] ?? s),
  );
  const stylist = (s: string) => (ID.test(s) ? (words.stylistName(s) ?? 'a stylist no longer listed') : s);
  push('Stylist', text(was.stylist, stylist), text(now.stylist, stylist));

  const sittingsWas = was.sittings ?? [];
  const sittingsNow = now.sittings ?? [];
  const of = Math.max(sittingsWas.length, sittingsNow.length);
  const bySeq = (list: SittingRecord[], seq: number) => list.find((s, i) => (s.sitting ?? i + 1) === seq);
  for (let seq = 1; seq <= of; seq++) {
    push(sittingLabel(seq, of) ?? 'Sitting', sittingText(bySeq(sittingsWas, seq), words.timeZone), sittingText(bySeq(sittingsNow, seq), words.timeZone));
  }

  // `deposit` is the outcome of a cancellation ('kept' or 'refunded'); an online payment recorded the amount paid (cents).
  const outcome = (d: unknown) => (d === 'kept' ? 'Kept by the salon' : d === 'refunded' ? 'Refunded to the client' : null);
  const paid = (d: unknown) => (typeof d === 'number' ? formatMoney(d, words.currency) : null);
  push('Deposit', outcome(was.deposit), outcome(now.deposit));
  push('Deposit paid', paid(was.deposit), paid(now.deposit));

  const known = new Set(['status', 'stylist', 'sittings', 'deposit']);
  const instant = (iso: string) => formatDateTime(iso, formatFor(words.timeZone), { width: 'short' });
  const rest = describeChange(
    Object.fromEntries(Object.entries(was).filter(([k]) => !known.has(k))),
    Object.fromEntries(Object.entries(now).filter(([k]) => !known.has(k))),
  );
  for (const c of rest)
    lines.push({
      label: fieldLabel(c.field),
      before: c.before === undefined ? null : valueText(c.before, instant),
      after: c.after === undefined ? null : valueText(c.after, instant),
    });
  return lines;
}

/**
 * What happened, in words: "Held online" for a time held while a client pays (no person did it, and older
 * entries recorded it as "booked" with the status Held); a moved sitting as "Moved sitting 2 of 2", or just
 * "Moved" for a one-sitting booking; else the action as recorded ("Cancelled: client moved away").
 */
export function entryTitle(action: string, after: unknown): string {
  const record = asRecord(after);
  if (action === 'booked' && record.status === 'held') return 'Held online';
  const moved = /^moved sitting (\d+)$/.exec(action);
  const of = record.sittings?.length ?? 0;
  if (moved && of > 0) return of > 1 ? `Moved ${sittingLabel(Number(moved[1]), of)!.toLowerCase()}` : 'Moved';
  return actionLabel(action);
}
