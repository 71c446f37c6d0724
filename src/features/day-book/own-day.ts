import type { DayView } from '@shared/schemas/booking-view.schemas';

/**
 * A stylist's day shows one column: theirs. The API sends only their bookings, so
 * their column is the one those bookings name (or their name on a day without bookings).
 */
export function ownDay(day: DayView, stylistName: string): DayView {
  const booked = new Set(day.bookings.map((b) => b.stylist.id));
  const mine = day.stylists.filter((s) => booked.has(s.id));
  const stylists = mine.length > 0 ? mine : day.stylists.filter((s) => s.name === stylistName);
  return { ...day, stylists: stylists.length > 0 ? stylists : [{ id: 'me', name: stylistName, skills: [] }] };
}
