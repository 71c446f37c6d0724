import type { Db } from '@server/db/database';
import type { AffectedBooking } from '@shared/schemas/setup.schemas';
import { freeStylists, planningSalon, type TakeOverAsk } from '../planning';
import { futureSittingIds, type FutureBooking } from './future-bookings.repository';
import { localDateOf, shiftLocalDate } from '@shared/time/salon-time';

/** The booking's future sittings as a take-over question, or null when none is left. */
async function takeOverAsk(db: Db, zone: string, booking: FutureBooking, now: Date): Promise<TakeOverAsk | null> {
  const sittings = await futureSittingIds(db, booking.id, now);
  const [first] = sittings;
  if (!first) return null;
  const from = localDateOf(first.start, zone);
  const to = shiftLocalDate(localDateOf(sittings[sittings.length - 1]!.end, zone), 1);
  return { skill: booking.skill, sittingIds: sittings.map((s) => s.id), horizon: { from, to } };
}

/**
 * For each booking, the stylists other than the booked one who could take its future sittings exactly as they
 * stand, by the same engine rules that plan new bookings (hours, time off, hands, client cap).
 */
async function freeStylistsFor(
  db: Db,
  salonId: string,
  zone: string,
  bookings: FutureBooking[],
  now: Date,
): Promise<Array<Array<{ id: string; name: string }>>> {
  const asks = await Promise.all(bookings.map((b) => takeOverAsk(db, zone, b, now)));
  const wanted = asks.filter((a): a is TakeOverAsk => a !== null);
  const found = wanted.length ? await freeStylists(db, await planningSalon(db, salonId), wanted) : [];
  // One answer per wanted ask, and one ask per booking.
  return asks.map((ask, i) => (ask ? found[wanted.indexOf(ask)]!.filter((s) => s.id !== bookings[i]!.stylistId) : []));
}

/** Stylists other than the booked one who could take this booking's future sittings exactly as they stand. */
export async function freeStylistIds(db: Db, salonId: string, zone: string, booking: FutureBooking, now: Date): Promise<string[]> {
  const [free] = await freeStylistsFor(db, salonId, zone, [booking], now);
  return free!.map((s) => s.id); // one answer per booking
}

/** The bookings in the answer shape, each with the stylists free to take it over. */
export async function withFreeStylists(db: Db, salonId: string, zone: string, bookings: FutureBooking[], now: Date): Promise<AffectedBooking[]> {
  const free = await freeStylistsFor(db, salonId, zone, bookings, now);
  return bookings.map((b, i) => ({
    id: b.id,
    clientName: b.clientName,
    serviceName: b.serviceName,
    stylistId: b.stylistId,
    stylistName: b.stylistName,
    start: b.start.toISOString(),
    freeStylists: free[i]!, // one answer per booking
  }));
}
