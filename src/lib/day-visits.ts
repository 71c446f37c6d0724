import type { BookingView, DayView, SittingView } from '@shared/schemas/booking-view.schemas';
import { localDateOf } from '@shared/time/salon-time';

export type Visit = { booking: BookingView; sitting: SittingView };

/** The day's sittings of the bookings `keep` accepts (a booking of several sittings only with that date's), in the order they start. */
export function visitsOn(day: DayView, keep: (booking: BookingView) => boolean): Visit[] {
  return day.bookings
    .filter(keep)
    .flatMap((booking) => booking.sittings.filter((s) => localDateOf(s.start, day.timeZone) === day.date).map((sitting) => ({ booking, sitting })))
    .sort((a, b) => a.sitting.start.localeCompare(b.sitting.start));
}
