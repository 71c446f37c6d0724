import { useSuspenseQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import { bookingQueries } from '@client/features/bookings/api/booking-queries';
import { BookedPage } from '@client/features/online-booking/components/booked-page';
import { salonQueries } from '@client/features/salon/api/salon-queries';
import { queryClient } from '@client/lib/query-client';
import { NotFoundMessage } from '../not-found-message';

/** The booking was just made, so the cached list is stale by definition: always read it fresh. */
export async function loader() {
  await Promise.all([queryClient.fetchQuery({ ...bookingQueries.mine(), staleTime: 0 }), queryClient.ensureQueryData(salonQueries.current())]);
  return null;
}

export function Component() {
  const { id = '' } = useParams();
  const { data: mine } = useSuspenseQuery(bookingQueries.mine());
  const { data: salon } = useSuspenseQuery(salonQueries.current());
  const booking = mine.bookings.find((b) => b.id === id);
  if (!booking) return <NotFoundMessage />;
  return <BookedPage booking={booking} salon={{ ...salon, timeZone: mine.timeZone }} />;
}
