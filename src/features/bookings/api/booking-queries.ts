import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { BookingHistorySchema } from '../../../../shared/schemas/booking.schemas';
import { BookingViewSchema, MyBookingsSchema } from '../../../../shared/schemas/booking-view.schemas';
import { apiGet } from '../../../lib/api-client';

export const bookingQueries = {
  all: () => ['bookings'] as const,
  mine: () =>
    queryOptions({
      queryKey: [...bookingQueries.all(), 'mine'] as const,
      queryFn: () => apiGet(apiPaths.myBookings, MyBookingsSchema),
    }),
  details: () => [...bookingQueries.all(), 'detail'] as const,
  detail: (id: string) =>
    queryOptions({
      queryKey: [...bookingQueries.details(), id] as const,
      queryFn: () => apiGet(apiPaths.booking(id), BookingViewSchema),
    }),
  /** Under the booking's key, so invalidating the booking refreshes its history too. */
  history: (id: string) =>
    queryOptions({
      queryKey: [...bookingQueries.details(), id, 'history'] as const,
      queryFn: () => apiGet(apiPaths.bookingHistory(id), BookingHistorySchema),
    }),
};
