import { useMutation, useQueryClient } from '@tanstack/react-query';
import { deskCheckoutApi } from '@shared/api/desk-checkout.api';
import type { DeskCheckoutBody } from '@shared/schemas/desk-checkout.schemas';
import { callApi } from '@client/lib/api-client';
import { checkoutChanged } from '@client/lib/cache-rules';

/** Checks the visit out; the server works out every amount again and answers the receipt. */
export function useCheckOut(bookingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: DeskCheckoutBody) => callApi(deskCheckoutApi.checkOut, { params: { id: bookingId }, body }),
    onSuccess: (checkout) => checkoutChanged(queryClient, checkout),
  });
}

/** The card part taken in cash instead: the server closes the payment page and checks the visit out. */
export function useTakeRestInCash(bookingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => callApi(deskCheckoutApi.restInCash, { params: { id: bookingId } }),
    onSuccess: (checkout) => checkoutChanged(queryClient, checkout),
  });
}
