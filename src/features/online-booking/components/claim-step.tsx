import { useEffect, useRef } from 'react';
import type { z } from 'zod';
import type { ClaimedHoldSchema } from '../../../../shared/schemas/online-booking.schemas';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { LoadingState } from '../../../components/ui/loading-state';
import { useClaimHold } from '../api/hold-mutations';

type Claimed = z.output<typeof ClaimedHoldSchema>;
type Props = { holdId: string; secret: string; onClaimed: (claimed: Claimed) => void };

/**
 * Ties the held time to the signed-in client as soon as they arrive: there is
 * nothing to decide, so it needs no button (only a retry when it fails).
 */
export function ClaimStep({ holdId, secret, onClaimed }: Props) {
  const claim = useClaimHold(holdId);
  const asked = useRef<string | null>(null);
  const { mutate } = claim;
  useEffect(() => {
    // Once per hold, even when React runs effects twice in development.
    if (asked.current === holdId) return;
    asked.current = holdId;
    mutate(secret, { onSuccess: onClaimed });
  }, [holdId, secret, mutate, onClaimed]);

  if (claim.isError && claim.error.code !== 'HOLD_LAPSED') {
    return (
      <div className="flex flex-col gap-3">
        <FormAlert>{claim.error.message}</FormAlert>
        <Button className="self-start" onClick={() => claim.mutate(secret, { onSuccess: onClaimed })}>
          Try again
        </Button>
      </div>
    );
  }
  return <LoadingState label="Keeping this time for you…" />;
}
