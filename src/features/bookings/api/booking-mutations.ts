import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { bookingsApi } from '@shared/api/bookings.api';
import type { CancelBookingSchema, ChangePlanSchema, CreateBooking, MoveSittingSchema } from '@shared/schemas/booking.schemas';
import { callApi } from '@client/lib/api-client';
import { bookingChanged, bookingMade } from '@client/lib/cache-rules';

export function useCreateBooking() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CreateBooking) => callApi(bookingsApi.create, { body }),
    onSuccess: (booking) => bookingMade(queryClient, booking),
  });
}

/** Move one sitting of any booking (the week calendar moves several bookings with one hook). */
export function useMoveSitting() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ bookingId, ...body }: z.input<typeof MoveSittingSchema> & { bookingId: string }) =>
      callApi(bookingsApi.move, { params: { id: bookingId }, body }),
    onSuccess: (booking) => bookingChanged(queryClient, booking),
  });
}

export function useCancelBooking(bookingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof CancelBookingSchema>) => callApi(bookingsApi.cancel, { params: { id: bookingId }, body }),
    onSuccess: (booking) => bookingChanged(queryClient, booking),
  });
}

/** Replaces the booking's step plan, sittings kept at their starts. */
export function useChangePlan(bookingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof ChangePlanSchema>) => callApi(bookingsApi.changePlan, { params: { id: bookingId }, body }),
    onSuccess: (booking) => bookingChanged(queryClient, booking),
  });
}
