import { useMemo, type ReactNode } from 'react';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import { isPast } from '@client/lib/time';
import { BookingCard } from './booking-card';

/** `actions`: drawn inside each booking's card (the client's own list adds move and cancel). */
type Props = { bookings: BookingView[]; timeZone: string; currency: string; actions?: (booking: BookingView) => ReactNode };

/**
 * Upcoming bookings first (soonest first), then cancelled ones with what became of their deposit, then past ones
 * (latest first). A cancelled booking is neither upcoming nor past, whatever its date.
 */
export function BookingList({ bookings, timeZone, currency, actions }: Props) {
  const { upcoming, cancelled, past } = useMemo(() => {
    const lastEnd = (b: BookingView) => b.sittings.at(-1)?.end ?? '';
    const firstStart = (b: BookingView) => b.sittings[0]?.start ?? '';
    const sorted = [...bookings].sort((a, b) => firstStart(a).localeCompare(firstStart(b)));
    const isCancelled = (b: BookingView) => b.status === 'cancelled';
    // A no-show booking is history even when its last sitting's end is still ahead.
    const over = (b: BookingView) => isPast(lastEnd(b)) || b.status === 'no_show';
    return {
      upcoming: sorted.filter((b) => !isCancelled(b) && !over(b)),
      cancelled: sorted.filter(isCancelled).reverse(),
      past: sorted.filter((b) => !isCancelled(b) && over(b)).reverse(),
    };
  }, [bookings]);

  const group = (title: string, list: BookingView[], empty: string | null) =>
    (list.length > 0 || empty) && (
      <section aria-label={title} className="flex flex-col gap-3">
        <h2 className="text-xl font-bold">{title}</h2>
        {list.length === 0 ? (
          <p className="text-ink/80">{empty}</p>
        ) : (
          list.map((booking) => (
            <BookingCard key={booking.id} booking={booking} timeZone={timeZone} currency={currency}>
              {actions?.(booking)}
            </BookingCard>
          ))
        )}
      </section>
    );

  return (
    <div className="flex flex-col gap-8">
      {group('Upcoming', upcoming, 'No upcoming bookings.')}
      {group('Cancelled', cancelled, null)}
      {group('Past', past, 'No past bookings yet.')}
    </div>
  );
}
