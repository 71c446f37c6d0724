import type { Db } from '@server/db/database';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import { bookingSkinTestStates } from '../skin-tests';
import { loadBookingViewRows, type BookingFilter } from './booking-views.repository';

/** Bookings as the book shows them, earliest first, each with the skin-test state its client's record gives it now. */
export async function loadBookingViews(db: Db, filter: BookingFilter, timeZone: string): Promise<BookingView[]> {
  const { rows, settings } = await loadBookingViewRows(db, filter, timeZone);
  if (!settings) return [];
  const states = await bookingSkinTestStates(
    db,
    { timeZone, ...settings },
    rows.map((r) => r.skinTestFooting),
    new Date(),
  );
  return rows.map((r, i) => ({ ...r.view, skinTest: states[i]! })); // one state per footing asked about
}
