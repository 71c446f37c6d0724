import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { SimulateInboundSmsResultSchema, simulateInboundSmsPath, type SimulateInboundSmsSchema } from '../../../../shared/schemas/inbound-sms.schemas';
import { apiWrite } from '../../../lib/api-client';

/** Demo: a client's phone "texts" the salon through the SMS fake; the send log and texts then change. */
export function useSimulateInboundSms() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.output<typeof SimulateInboundSmsSchema>) => apiWrite('POST', simulateInboundSmsPath, body, SimulateInboundSmsResultSchema),
    onSuccess: () => queryClient.invalidateQueries(),
  });
}
