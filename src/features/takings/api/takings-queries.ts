import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { takingsApi } from '@shared/api/takings.api';
import type { CloseDayBodySchema } from '@shared/schemas/takings.schemas';
import { apiQuery, callApi } from '@client/lib/api-client';
import { dayCloseChanged } from '@client/lib/cache-rules';

export const takingsQueries = {
  /** A salon day's takings and its close; read afresh, as payments come in all day. */
  day: (date: string) => ({ ...apiQuery(takingsApi.day, { query: { date } }), staleTime: 0 }),
};

/** Closes the day with the cash counted. */
export function useCloseDay() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: z.input<typeof CloseDayBodySchema>) => callApi(takingsApi.close, { body }),
    onSuccess: (takings) => dayCloseChanged(queryClient, takings),
  });
}

/** Reopens a closed day (the owner's). */
export function useReopenDay() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (date: string) => callApi(takingsApi.reopen, { body: { date } }),
    onSuccess: (takings) => dayCloseChanged(queryClient, takings),
  });
}
