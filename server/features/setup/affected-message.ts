import { DateTime } from 'luxon';
import type { FutureBooking } from './future-bookings.repository';

/** "2 future bookings: Thu 10 Dec 09:00 Ana Ruiz (Full lightening, Jess), …" for refusals. */
export function affectedMessage(lead: string, bookings: FutureBooking[], zone: string): string {
  const list = bookings
    .slice(0, 10)
    .map((b) => `${DateTime.fromJSDate(b.start, { zone }).toFormat('ccc d LLL HH:mm')} ${b.clientName} (${b.serviceName}, ${b.stylistName})`)
    .join('; ');
  const more = bookings.length > 10 ? `; and ${bookings.length - 10} more` : '';
  return `${lead} ${bookings.length} future ${bookings.length === 1 ? 'booking' : 'bookings'}: ${list}${more}.`;
}
