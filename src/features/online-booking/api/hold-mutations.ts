import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { apiPaths } from '../../../../shared/api/api-paths';
import {
  ClaimedHoldSchema,
  CreatedHoldSchema,
  ResumedHoldSchema,
  type CreateHoldSchema,
  type PayHoldSchema,
} from '../../../../shared/schemas/online-booking.schemas';
import { BookingViewSchema } from '../../../../shared/schemas/booking-view.schemas';
import { apiWrite } from '../../../lib/api-client';
import { isApiError } from '../../../lib/api-error';
import { bookingQueries } from '../../bookings/api/booking-queries';
import { onlineBookingQueries } from './online-booking-queries';

/** Hold a free time. Taken meanwhile (409): the free times are stale, so they are fetched again. */
export function useCreateHold() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof CreateHoldSchema>) => apiWrite('POST', apiPaths.holds, body, CreatedHoldSchema),
    onSuccess: (hold) => queryClient.setQueryData(onlineBookingQueries.hold(hold.holdId).queryKey, hold),
    onError: (error) => {
      if (isApiError(error, 'CONFLICT')) return queryClient.invalidateQueries({ queryKey: onlineBookingQueries.availabilities() });
      // Another tab held a time meanwhile: the step shows that hold instead.
      if (isApiError(error, 'HOLD_OPEN')) return queryClient.invalidateQueries({ queryKey: onlineBookingQueries.myHolds().queryKey });
    },
  });
}

/** Back into the flow with the client's own hold: a new secret, its cautions and the step to return to. */
export function useResumeHold() {
  return useMutation({
    mutationFn: (holdId: string) => apiWrite('POST', apiPaths.resumeHold(holdId), {}, ResumedHoldSchema),
  });
}

/** Frees a held time at once; every list that showed it, and the free times, are read again. */
export function useReleaseHold() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ holdId, secret }: { holdId: string; secret?: string }) => apiWrite('POST', apiPaths.releaseHold(holdId), { secret }),
    onSettled: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: onlineBookingQueries.myHolds().queryKey }),
        queryClient.invalidateQueries({ queryKey: onlineBookingQueries.availabilities() }),
        queryClient.invalidateQueries({ queryKey: bookingQueries.mine().queryKey }),
      ]),
  });
}

/** Any write on a hold can find it lapsed; the cached hold is then refreshed so every step sees it. */
function useHoldWrite<Body, Answer>(holdId: string, write: (body: Body) => Promise<Answer>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: write,
    onError: (error) => {
      if (isApiError(error, 'HOLD_LAPSED')) return queryClient.invalidateQueries({ queryKey: onlineBookingQueries.hold(holdId).queryKey });
    },
  });
}

export function useClaimHold(holdId: string) {
  return useHoldWrite(holdId, (secret: string) => apiWrite('POST', apiPaths.claimHold(holdId), { secret }, ClaimedHoldSchema));
}

export function useAcceptCautions(holdId: string) {
  return useHoldWrite(holdId, (body: { version: string; secret: string }) => apiWrite('POST', apiPaths.acceptCautions(holdId), body));
}

export function usePayHold(holdId: string) {
  return useHoldWrite(holdId, (body: z.input<typeof PayHoldSchema>) => apiWrite('POST', apiPaths.payHold(holdId), body, BookingViewSchema));
}
