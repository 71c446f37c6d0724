import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { paymentsApi } from '@shared/api/payments.api';
import type { RefundBodySchema } from '@shared/schemas/payments.schemas';
import { apiQuery, callApi } from '@client/lib/api-client';
import { refundMade } from '@client/lib/cache-rules';

export const refundQueries = {
  /** A booking's payments in and its refunds. */
  ofBooking: (bookingId: string) => apiQuery(paymentsApi.payments, { params: { id: bookingId } }),
};

/** Refunds (part of) one of the booking's payments with a reason. */
export function useRefund(bookingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof RefundBodySchema>) => callApi(paymentsApi.refund, { params: { id: bookingId }, body }),
    onSuccess: (money) => refundMade(queryClient, money),
  });
}
