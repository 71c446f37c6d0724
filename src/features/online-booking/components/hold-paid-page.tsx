import { useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { DateTime } from 'luxon';
import { Link, Navigate } from 'react-router-dom';
import { buttonClasses } from '@client/components/ui/button';
import { LoadingState } from '@client/components/ui/loading-state';
import { Notice } from '@client/components/ui/notice';
import { paths } from '@client/config/paths';
import { useNow } from '@client/lib/use-now';
import { onlineBookingQueries } from '../api/online-booking-queries';
import { forgetStoredHold, readStoredHold } from '../hold-store';

/** How often the page asks whether the payment service's confirmation has come in. */
const POLL_MS = 1_500;
/** After this long it says the confirmation is slow (it keeps waiting). */
const SLOW_MS = 30_000;

type Props = { holdId: string };

/**
 * Where the payment service's page sends the client after paying. The payment counts only once the service's signed
 * confirmation (its webhook) reaches the salon, so this page waits for the hold to become a booking and says so; then
 * it shows the booking. A hold that lapsed first was not booked: any payment for it is refunded, and the client told.
 */
export function HoldPaidPage({ holdId }: Props) {
  const hold = useQuery({
    ...onlineBookingQueries.hold(holdId),
    refetchInterval: (query) => (query.state.data?.status === 'held' ? POLL_MS : false),
    retry: false,
  });
  const [arrived] = useState(() => DateTime.now());
  const slow = useNow(5_000).diff(arrived).toMillis() > SLOW_MS;
  const booked = hold.data?.status === 'booked';
  useEffect(() => {
    if (booked) forgetStoredHold(holdId);
  }, [booked, holdId]);

  if (booked) return <Navigate to={paths.bookingConfirmed(holdId)} replace />;
  const lapsed = hold.data?.status === 'lapsed' || hold.error?.code === 'HOLD_LAPSED' || hold.error?.status === 404;
  if (lapsed) {
    const stored = readStoredHold();
    return (
      <div className="mx-auto flex w-full max-w-2xl flex-col gap-5">
        <Notice tone="caution" title="Your held time was released before the payment was confirmed">
          <p>The time is free for others again. If your card was charged, the payment is refunded in full and we send you a message when it is.</p>
        </Notice>
        <Link to={stored ? paths.salonBook(stored.slug, stored.serviceId) : paths.me} className={buttonClasses('primary')}>
          Pick a time again
        </Link>
      </div>
    );
  }
  if (hold.isError)
    return (
      <Notice tone="danger" title="We could not check your booking">
        {hold.error.message}
      </Notice>
    );
  return (
    <div className="mx-auto flex w-full max-w-2xl flex-col gap-5">
      <h1 className="text-3xl font-extrabold tracking-tight">Almost done</h1>
      <LoadingState label="Waiting for the payment to be confirmed…" />
      <p>The payment service tells the salon directly; this page moves on by itself as soon as it does.</p>
      {slow && <p role="status">This is taking longer than usual. You can stay here, or find the booking under My bookings once it is confirmed.</p>}
    </div>
  );
}
