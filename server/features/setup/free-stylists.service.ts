import type { Db } from '../../db/database';
import type { AffectedBooking } from '../../../shared/schemas/setup.schemas';
import { findFreeStylists } from '../../../shared/engine/engine';
import { loadSalonCalendars } from '../planning/salon-calendars.repository';
import { futureSittingIds, type FutureBooking } from './future-bookings.repository';
import { localDateOf, shiftLocalDate } from '../../../shared/time/salon-time';
import { salonStaffNames } from './staff-setup.repository';

/**
 * Stylists other than the booked one who could take a booking's future sittings exactly as they stand,
 * by the same engine rules that plan new bookings (hours, time off, hands, client cap).
 */
export async function freeStylistIds(db: Db, salonId: string, zone: string, booking: FutureBooking, now: Date): Promise<string[]> {
  const sittings = await futureSittingIds(db, booking.id, now);
  if (sittings.length === 0) return [];
  const from = localDateOf(sittings[0].start, zone);
  const to = shiftLocalDate(localDateOf(sittings[sittings.length - 1].end, zone), 1);
  const calendars = await loadSalonCalendars(db, salonId, { from, to });
  const mine = new Set(sittings.map((s) => s.id));
  const others = { ...calendars, bookings: calendars.bookings.filter((b) => !mine.has(b.id)) };
  const own = calendars.bookings.filter((b) => mine.has(b.id));
  return findFreeStylists(others, booking.skill, own).filter((id) => id !== booking.stylistId);
}

/** The bookings in the answer shape, each with the stylists free to take it over. */
export async function withFreeStylists(db: Db, salonId: string, zone: string, bookings: FutureBooking[], now: Date): Promise<AffectedBooking[]> {
  const names = await salonStaffNames(db, salonId);
  return Promise.all(
    bookings.map(async (b) => ({
      id: b.id,
      clientName: b.clientName,
      serviceName: b.serviceName,
      stylistId: b.stylistId,
      stylistName: b.stylistName,
      start: b.start.toISOString(),
      freeStylists: (await freeStylistIds(db, salonId, zone, b, now)).map((id) => ({ id, name: names.get(id) ?? id })),
    })),
  );
}
