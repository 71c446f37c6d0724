import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { paymentsApi } from '@shared/api/payments.api';
import type { DepositTakenBodySchema } from '@shared/schemas/payments.schemas';
import { callApi } from '@client/lib/api-client';
import { depositChanged } from '@client/lib/cache-rules';

/** Sends the client a link to pay the deposit due, by SMS or e-mail. */
export function useRequestDeposit(bookingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (channel: 'sms' | 'email') => callApi(paymentsApi.requestDeposit, { params: { id: bookingId }, body: { channel } }),
    onSuccess: (details) => depositChanged(queryClient, details),
  });
}

/** Records the deposit due as taken at the desk, in cash or on the card terminal. */
export function useMarkDepositTaken(bookingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof DepositTakenBodySchema>) => callApi(paymentsApi.depositTaken, { params: { id: bookingId }, body }),
    onSuccess: (details) => depositChanged(queryClient, details),
  });
}

/** Where to pay a deposit request (the payment service's page); the amount is the server's. */
export function usePayDepositRequest(token: string) {
  return useMutation({ mutationFn: () => callApi(paymentsApi.payDepositRequest, { params: { token }, body: {} }) });
}
