import type { AffectedBooking } from '@shared/schemas/setup.schemas';
import { formatDate, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

type Props = { bookings: AffectedBooking[]; timeZone: string; label: string; action?: (b: AffectedBooking) => React.ReactNode };

/** Future bookings a set-up change touches, listed before the change, each with an optional action. */
export function AffectedBookings({ bookings, timeZone, label, action }: Props) {
  if (bookings.length === 0) return <p>No future bookings are affected.</p>;
  return (
    <ul aria-label={label} className="flex flex-col gap-2">
      {bookings.map((b) => (
        <li key={b.id} className="flex flex-wrap items-end justify-between gap-3 rounded-lg bg-linen p-3">
          <span>
            <span className="font-bold">
              {formatDate(b.start, formatFor(timeZone), { width: 'short' })} {formatTime(b.start, formatFor(timeZone))}
            </span>{' '}
            · {b.clientName} · {b.serviceName} · with {b.stylistName}
          </span>
          {action?.(b)}
        </li>
      ))}
    </ul>
  );
}
