import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { onlineBookingApi } from '@shared/api/online-booking.api';
import type { CreateHoldSchema } from '@shared/schemas/online-booking.schemas';
import { callApi } from '@client/lib/api-client';
import { isApiError } from '@client/lib/api-error';
import { freeTimesTaken, holdLapsed, holdReleased, openHoldsChanged, timeHeld } from '@client/lib/cache-rules';

/** Hold a free time. Taken meanwhile (409): the free times are stale, so they are fetched again. */
export function useCreateHold() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof CreateHoldSchema>) => callApi(onlineBookingApi.createHold, { body }),
    onSuccess: (hold) => timeHeld(queryClient, hold),
    onError: (error) => {
      if (isApiError(error, 'CONFLICT')) return freeTimesTaken(queryClient);
      // Another tab held a time meanwhile: the step shows that hold instead.
      if (isApiError(error, 'HOLD_OPEN')) return openHoldsChanged(queryClient);
    },
  });
}

/** Back into the flow with the client's own hold: a new secret, its cautions and the step to return to. */
export function useResumeHold() {
  return useMutation({
    mutationFn: (holdId: string) => callApi(onlineBookingApi.resumeHold, { params: { id: holdId }, body: {} }),
  });
}

/** Frees a held time at once; every list that showed it, and the free times, are read again. */
export function useReleaseHold() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ holdId, secret }: { holdId: string; secret?: string }) =>
      callApi(onlineBookingApi.releaseHold, { params: { id: holdId }, body: { secret } }),
    onSettled: () => holdReleased(queryClient),
  });
}

/** Any write on a hold can find it lapsed; the cached hold is then refreshed so every step sees it. */
function useHoldWrite<Body, Answer>(holdId: string, write: (body: Body) => Promise<Answer>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: write,
    onError: (error) => {
      if (isApiError(error, 'HOLD_LAPSED')) return holdLapsed(queryClient, holdId);
    },
  });
}

export function useClaimHold(holdId: string) {
  return useHoldWrite(holdId, (secret: string) => callApi(onlineBookingApi.claimHold, { params: { id: holdId }, body: { secret } }));
}

export function useAcceptCautions(holdId: string) {
  return useHoldWrite(holdId, (body: { version: string; secret: string }) => callApi(onlineBookingApi.acceptCautions, { params: { id: holdId }, body }));
}

/** Where to pay the hold's deposit (the payment service's page), or null when it was booked at once (no deposit). */
export function usePayHold(holdId: string) {
  return useHoldWrite(holdId, (secret: string) => callApi(onlineBookingApi.payHold, { params: { id: holdId }, body: { secret } }));
}
