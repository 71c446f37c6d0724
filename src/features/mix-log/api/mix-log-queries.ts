import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { mixLogsApi } from '@shared/api/mix-logs.api';
import type { RepeatMixLogSchema, WriteMixLog } from '@shared/schemas/mix-log.schemas';
import { apiQuery, callApi } from '@client/lib/api-client';
import { mixLogChanged } from '@client/lib/cache-rules';

export const mixLogQueries = {
  list: (bookingId: string) => apiQuery(mixLogsApi.list, { params: { id: bookingId } }),
};

export function useWriteMixLog(bookingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: WriteMixLog) => callApi(mixLogsApi.write, { params: { id: bookingId }, body }),
    onSuccess: () => mixLogChanged(queryClient, bookingId),
  });
}

export function useRepeatMixLog(bookingId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof RepeatMixLogSchema>) => callApi(mixLogsApi.repeat, { params: { id: bookingId }, body }),
    onSuccess: () => mixLogChanged(queryClient, bookingId),
  });
}
