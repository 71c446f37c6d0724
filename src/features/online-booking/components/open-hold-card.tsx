import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import type { OpenHold } from '@shared/schemas/online-booking.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { useReleaseHold, useResumeHold } from '../api/hold-mutations';
import { openHoldsChanged } from '@client/lib/cache-rules';
import { forgetStoredHold, storedFromResumed, type StoredHold } from '../hold-store';
import { HoldSummary } from './hold-summary';

type Props = {
  hold: OpenHold;
  /** The hold as the flow keeps it, with a new secret: the caller goes back into the flow with it. */
  onResumed: (stored: StoredHold) => void;
  onReleased?: () => void;
};

/**
 * A client's own unpaid hold, waiting for payment: what and when, how long it is kept, and the two ways on —
 * back into the flow at its step, or release the time at once.
 */
export function OpenHoldCard({ hold, onResumed, onReleased }: Props) {
  const queryClient = useQueryClient();
  const resume = useResumeHold();
  const release = useReleaseHold();
  const onExpire = useCallback(() => void openHoldsChanged(queryClient), [queryClient]);
  const problem = resume.error ?? release.error;
  return (
    <HoldSummary
      hold={hold}
      onExpire={onExpire}
      action={
        <div className="mt-2 flex flex-col gap-3">
          <p className="text-sm text-ink/80">Waiting for payment: the time is kept for you only until then; unpaid, it is released for others.</p>
          {problem && <FormAlert>{problem.message}</FormAlert>}
          <div className="flex flex-wrap gap-2">
            <Button busy={resume.isPending} onClick={() => resume.mutate(hold.holdId, { onSuccess: (resumed) => onResumed(storedFromResumed(resumed)) })}>
              Resume booking
            </Button>
            <Button
              variant="secondary"
              busy={release.isPending}
              onClick={() =>
                release.mutate(
                  { holdId: hold.holdId },
                  {
                    onSuccess: () => {
                      forgetStoredHold(hold.holdId);
                      onReleased?.();
                    },
                  },
                )
              }
            >
              Release this time
            </Button>
          </div>
        </div>
      }
    />
  );
}
