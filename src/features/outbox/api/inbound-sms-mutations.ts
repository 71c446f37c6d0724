import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { messagesApi } from '@shared/api/messages.api';
import type { SimulateInboundSmsSchema } from '@shared/schemas/inbound-sms.schemas';
import { callApi } from '@client/lib/api-client';
import { inboundSmsReceived } from '@client/lib/cache-rules';

/** Demo: a client's phone "texts" the salon through the SMS fake; the send log and texts then change. */
export function useSimulateInboundSms() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.output<typeof SimulateInboundSmsSchema>) => callApi(messagesApi.simulateInboundSms, { body }),
    onSuccess: () => inboundSmsReceived(queryClient),
  });
}
