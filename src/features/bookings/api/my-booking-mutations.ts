import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { onlineBookingApi } from '@shared/api/online-booking.api';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import type { ClientCancelSchema } from '@shared/schemas/online-booking.schemas';
import { callApi } from '@client/lib/api-client';
import { myBookingChanged } from '@client/lib/cache-rules';

/** The answer replaces the booking in the client's list; refetching the list catches anything else that changed. */
function useMyBookingWrite<Body>(write: (body: Body) => Promise<BookingView>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: write,
    onSuccess: () => myBookingChanged(queryClient),
  });
}

export function useCancelMyBooking(id: string) {
  return useMyBookingWrite((body: z.input<typeof ClientCancelSchema>) => callApi(onlineBookingApi.myCancel, { params: { id }, body }));
}

export function useMoveMyBooking(id: string) {
  return useMyBookingWrite((start: string) => callApi(onlineBookingApi.myMove, { params: { id }, body: { start } }));
}
