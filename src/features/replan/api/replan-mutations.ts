import { useMutation, useQueryClient } from '@tanstack/react-query';
import { replanApi } from '@shared/api/replan.api';
import type { ApplicableFix } from '@shared/schemas/replan.schemas';
import { callApi } from '@client/lib/api-client';
import { replanFixApplied, runningLateTold } from '@client/lib/cache-rules';

/** One fix from the "Running late" panel, applied with one action. */
export function useApplyFix() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ bookingId, fix }: { bookingId: string; fix: ApplicableFix }) => callApi(replanApi.applyFix, { params: { id: bookingId }, body: { fix } }),
    onSuccess: (applied, { bookingId }) => replanFixApplied(queryClient, bookingId, applied.day),
  });
}

/** "Tell the client": the later client of one sitting is told the delay the conflict shows. */
export function useTellRunningLate() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ bookingId, seq, minutesLate }: { bookingId: string; seq: number; minutesLate: number }) =>
      callApi(replanApi.tellRunningLate, { params: { id: bookingId, n: String(seq) }, body: { minutesLate } }),
    onSuccess: () => runningLateTold(queryClient),
  });
}
