import { useMutation, useQueryClient } from '@tanstack/react-query';
import { dayOfServiceApi } from '@shared/api/day-of-service.api';
import type { SittingRun, SteppedSittingRun } from '@shared/schemas/day-of-service.schemas';
import { callApi } from '@client/lib/api-client';
import { sittingTapped } from '@client/lib/cache-rules';

/** One tap on a sitting: which booking and sitting (from 1), what, and the step (from 1) for a step's start or finish. */
export type SittingTap = { bookingId: string; seq: number } & (
  { action: 'arrive' | 'no_show' | 'undo' } | { action: 'start' | 'finish'; step: number } | { action: 'finish_sitting'; reason: string }
);

/** Arrival and no-show answer the sitting; a tap that sets an actual time also answers the re-plan of the stylist's day. */
function send(tap: SittingTap): Promise<SittingRun | SteppedSittingRun> {
  const sitting = { id: tap.bookingId, n: String(tap.seq) };
  switch (tap.action) {
    case 'arrive':
      return callApi(dayOfServiceApi.arrive, { params: sitting });
    case 'no_show':
      return callApi(dayOfServiceApi.noShow, { params: sitting });
    case 'undo':
      return callApi(dayOfServiceApi.undo, { params: sitting });
    case 'start':
      return callApi(dayOfServiceApi.startStep, { params: { ...sitting, k: String(tap.step) } });
    case 'finish':
      return callApi(dayOfServiceApi.finishStep, { params: { ...sitting, k: String(tap.step) } });
    case 'finish_sitting':
      return callApi(dayOfServiceApi.finishSitting, { params: sitting, body: { leaveOpen: true, reason: tap.reason } });
  }
}

/** Taps on one sitting; the answer (with the undo it allows) stays on the mutation for the Undo button. */
export function useSittingTap() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: send, onSuccess: (run) => sittingTapped(queryClient, run.booking.id) });
}
