import { useSuspenseQuery } from '@tanstack/react-query';
import { useNavigate } from 'react-router-dom';
import { paths } from '@client/config/paths';
import { onlineBookingQueries } from '../api/online-booking-queries';
import { writeStoredHold } from '../hold-store';
import { OpenHoldCard } from './open-hold-card';

/**
 * My bookings' list of the client's unpaid held time (at most one): resume goes back into the online flow at the
 * step it had reached; release frees the time at once. Nothing shows when there is none.
 */
export function WaitingForPayment() {
  const navigate = useNavigate();
  const { data } = useSuspenseQuery(onlineBookingQueries.myHolds());
  if (data.holds.length === 0) return null;
  return (
    <section aria-labelledby="waiting-heading" className="mb-8 flex flex-col gap-3">
      <h2 id="waiting-heading" className="text-xl font-bold">
        Waiting for payment
      </h2>
      {data.holds.map((hold) => (
        <OpenHoldCard
          key={hold.holdId}
          hold={hold}
          onResumed={(stored) => {
            writeStoredHold(stored);
            navigate(paths.salonBook(stored.slug, stored.serviceId));
          }}
        />
      ))}
    </section>
  );
}
