import { queryOptions, useMutation, useQueryClient } from '@tanstack/react-query';
import {
  MixLogListSchema, MixLogSchema, RepeatMixLogResultSchema, type WriteMixLog,
} from '../../../../shared/schemas/mix-log.schemas';
import { apiGet, apiWrite } from '../../../lib/api-client';

export const mixLogPath = (bookingId: string) => `/api/bookings/${bookingId}/mix-logs`;
/** The stylist's page for one booking's mix log (kept beside its API path so links and the router agree). */
export const stylistMixLogPath = (bookingId: string, clientId?: string) =>
  `/stylist/bookings/${bookingId}/mix-log${clientId ? `?client=${encodeURIComponent(clientId)}` : ''}`;

export const mixLogQueries = {
  all: () => ['mix-logs'] as const,
  list: (bookingId: string) =>
    queryOptions({ queryKey: [...mixLogQueries.all(), bookingId] as const, queryFn: () => apiGet(mixLogPath(bookingId), MixLogListSchema) }),
};

export function useWriteMixLog(bookingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: WriteMixLog) => apiWrite('POST', mixLogPath(bookingId), body, MixLogSchema),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: mixLogQueries.list(bookingId).queryKey }),
  });
}

export function useRepeatMixLog(bookingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: { fromBookingId: string; sitting: number; intoSitting: number }) =>
      apiWrite('POST', `${mixLogPath(bookingId)}/repeat`, body, RepeatMixLogResultSchema),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: mixLogQueries.list(bookingId).queryKey }),
  });
}
