import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { BookingHistorySchema } from '../../../../shared/schemas/booking.schemas';
import { BookingViewSchema, MyBookingsSchema } from '../../../../shared/schemas/booking-view.schemas';
import { AvailabilitySchema, CancelTermsSchema } from '../../../../shared/schemas/online-booking.schemas';
import { apiGet, withQuery } from '../../../lib/api-client';

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
  /** Free times to move one sitting to (under the booking's key: a move refreshes them). */
  moveTimes: (id: string, ask: { sitting: number; stylistId?: string; from?: string }) =>
    queryOptions({
      queryKey: [...bookingQueries.details(), id, 'move-times', ask.sitting, ask.stylistId ?? 'same', ask.from ?? 'first'] as const,
      queryFn: () => apiGet(withQuery(apiPaths.moveTimes(id), { sitting: String(ask.sitting), stylistId: ask.stylistId, from: ask.from }), AvailabilitySchema),
      staleTime: 15_000,
    }),
  // Terms depend on the clock (the cancellation window), so they are read fresh each time they are shown.
  cancelTerms: (id: string) =>
    queryOptions({
      queryKey: [...bookingQueries.details(), id, 'cancel-terms'] as const,
      queryFn: () => apiGet(apiPaths.cancelTerms(id), CancelTermsSchema),
      staleTime: 0,
    }),
};
