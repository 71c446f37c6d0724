import type { QueryClient } from '@tanstack/react-query';
import type { BookingView } from '../../../../shared/schemas/booking-view.schemas';
import { dayQueries } from '../../day-book/api/day-queries';
import { weekQueries } from '../../week/api/week-queries';
import { windowsChanged } from '../../../lib/cache-rules';
import { bookingQueries } from './booking-queries';

/**
 * After a booking is written: cache the server's answer for its own page, and
 * refresh the views whose times it touches (days, weeks, hands-free windows), its
 * history and its free times to move to. The day and week keys are by date, and a
 * move can change dates, so those are refreshed by prefix.
 */
export function bookChanged(queryClient: QueryClient, booking: BookingView): Promise<unknown> {
  queryClient.setQueryData(bookingQueries.detail(booking.id).queryKey, booking);
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: bookingQueries.history(booking.id).queryKey }),
    queryClient.invalidateQueries({ queryKey: [...bookingQueries.details(), booking.id, 'move-times'] }),
    queryClient.invalidateQueries({ queryKey: dayQueries.all() }),
    queryClient.invalidateQueries({ queryKey: weekQueries.all() }),
    windowsChanged(queryClient),
  ]);
}
