import type { FutureBooking } from './future-bookings.repository';
import { formatDateTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

/** "2 future bookings: Thu 10 Dec, 9:00 AM Ana Ruiz (Full lightening, Jess), …" for refusals. */
export function affectedMessage(lead: string, bookings: FutureBooking[], zone: string): string {
  const list = bookings
    .slice(0, 10)
    .map((b) => `${formatDateTime(b.start, formatFor(zone), { width: 'short', year: false })} ${b.clientName} (${b.serviceName}, ${b.stylistName})`)
    .join('; ');
  const more = bookings.length > 10 ? `; and ${bookings.length - 10} more` : '';
  return `${lead} ${bookings.length} future ${bookings.length === 1 ? 'booking' : 'bookings'}: ${list}${more}.`;
}
