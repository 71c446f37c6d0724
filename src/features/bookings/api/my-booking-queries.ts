import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { apiPaths } from '../../../../shared/api/api-paths';
import { BookingViewSchema } from '../../../../shared/schemas/booking-view.schemas';
import { AvailabilitySchema, CancelTermsSchema, type ClientCancelSchema } from '../../../../shared/schemas/online-booking.schemas';
import { apiGet, apiWrite, withQuery } from '../../../lib/api-client';
import { bookingQueries } from './booking-queries';

/** A client's own bookings: what cancelling would mean now, and the times a booking could move to. */
export const myBookingQueries = {
  all: () => [...bookingQueries.all(), 'mine', 'manage'] as const,
  // Terms depend on the clock (the cancellation window), so they are read fresh each time they are shown.
  cancelTerms: (id: string) =>
    queryOptions({
      queryKey: [...myBookingQueries.all(), id, 'cancel-terms'] as const,
      queryFn: () => apiGet(apiPaths.myCancelTerms(id), CancelTermsSchema),
      staleTime: 0,
    }),
  moveTimes: (id: string, from?: string) =>
    queryOptions({
      queryKey: [...myBookingQueries.all(), id, 'move-times', from ?? 'now'] as const,
      queryFn: () => apiGet(withQuery(apiPaths.myMoveTimes(id), { from }), AvailabilitySchema),
      staleTime: 15_000,
    }),
};

/** The answer replaces the booking in the client's list; refetching the list catches anything else that changed. */
function useMyBookingWrite<Body>(write: (body: Body) => Promise<z.output<typeof BookingViewSchema>>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: write,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: bookingQueries.mine().queryKey }),
  });
}

export function useCancelMyBooking(id: string) {
  return useMyBookingWrite((body: z.input<typeof ClientCancelSchema>) => apiWrite('POST', apiPaths.myCancel(id), body, BookingViewSchema));
}

export function useMoveMyBooking(id: string) {
  return useMyBookingWrite((start: string) => apiWrite('POST', apiPaths.myMove(id), { start }, BookingViewSchema));
}
