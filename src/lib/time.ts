import { DateTime } from 'luxon';
import { instantIso, localDateOf } from '@shared/time/salon-time';
import { formatFor, type FormatContext } from '@shared/format/locale';

/*
 * The client's own readings of the clock. Conversions between instants and the salon's wall clock are in
 * shared/time/salon-time.ts and the way dates and times are written in shared/format/date-time.ts.
 */

/** Today's date on the salon's calendar (the device's clock, the salon's zone). */
export function todayIn(zone: string): string {
  return localDateOf(new Date(), zone);
}

/** The current minute as ISO 8601 with the salon's offset: the default for "when was this done". */
export function nowInZone(zone: string): string {
  return instantIso(new Date(Math.floor(Date.now() / 60_000) * 60_000), zone);
}

/** The format context of the device's own zone, for the few lists shown where no salon is loaded. */
export function deviceFormat(): FormatContext {
  return formatFor(Intl.DateTimeFormat().resolvedOptions().timeZone);
}

export function minutesBetween(startIso: string, endIso: string): number {
  return Math.round(DateTime.fromISO(endIso).diff(DateTime.fromISO(startIso), 'minutes').minutes);
}

export function isPast(iso: string): boolean {
  return DateTime.fromISO(iso) < DateTime.now();
}
