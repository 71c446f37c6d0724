import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { apiPaths } from '../../../../shared/api/api-paths';
import {
  BookingOptionsResponseSchema,
  type BookingOptionsRequest,
  type CancelBookingSchema,
  type ChangePlanSchema,
  type CreateBooking,
  type MoveSittingSchema,
} from '../../../../shared/schemas/booking.schemas';
import { BookingViewSchema } from '../../../../shared/schemas/booking-view.schemas';
import { apiWrite } from '../../../lib/api-client';
import { clientQueries } from '../../clients/api/client-queries';
import { bookChanged } from './book-changed';

/** Ask the engine for options. A POST that changes nothing, so nothing to invalidate. */
export function useFindTimes() {
  return useMutation({
    mutationFn: (body: BookingOptionsRequest) => apiWrite('POST', apiPaths.bookingOptions, body, BookingOptionsResponseSchema),
  });
}

export function useCreateBooking() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateBooking) => apiWrite('POST', apiPaths.bookings, body, BookingViewSchema),
    onSuccess: (booking) =>
      Promise.all([
        bookChanged(queryClient, booking),
        queryClient.invalidateQueries({ queryKey: clientQueries.detail(booking.client.id).queryKey }),
      ]),
  });
}

/** Move one sitting of any booking (the week calendar moves several bookings with one hook). */
export function useMoveSitting() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ bookingId, ...body }: z.input<typeof MoveSittingSchema> & { bookingId: string }) =>
      apiWrite('POST', apiPaths.moveSitting(bookingId), body, BookingViewSchema),
    onSuccess: (booking) => bookChanged(queryClient, booking),
  });
}

export function useCancelBooking(bookingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof CancelBookingSchema>) => apiWrite('POST', apiPaths.cancelBooking(bookingId), body, BookingViewSchema),
    onSuccess: (booking) => bookChanged(queryClient, booking),
  });
}

/** Replaces the booking's step plan, sittings kept at their starts. */
export function useChangePlan(bookingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof ChangePlanSchema>) => apiWrite('POST', apiPaths.changePlan(bookingId), body, BookingViewSchema),
    onSuccess: (booking) => bookChanged(queryClient, booking),
  });
}
