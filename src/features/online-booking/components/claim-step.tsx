import { useQuery } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';
import type { z } from 'zod';
import type { ClaimedHoldSchema } from '@shared/schemas/online-booking.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { LoadingState } from '@client/components/ui/loading-state';
import { useClaimHold, useReleaseHold } from '../api/hold-mutations';
import { onlineBookingQueries } from '../api/online-booking-queries';
import type { StoredHold } from '../hold-store';
import { OpenHoldCard } from './open-hold-card';

type Claimed = z.output<typeof ClaimedHoldSchema>;
type Props = { holdId: string; secret: string; onClaimed: (claimed: Claimed) => void; onResumedOther: (stored: StoredHold) => void };

/**
 * Ties the held time to the signed-in client as soon as they arrive: there is
 * nothing to decide, so it needs no button (only a retry when it fails). A client
 * who already holds another time (held before signing in elsewhere) chooses one:
 * go back to that one (this one is released), or release that one and keep this.
 */
export function ClaimStep({ holdId, secret, onClaimed, onResumedOther }: Props) {
  const claim = useClaimHold(holdId);
  const releaseThis = useReleaseHold();
  const asked = useRef<string | null>(null);
  const { mutate } = claim;
  const holdOpen = claim.isError && claim.error.code === 'HOLD_OPEN';
  const other = useQuery({ ...onlineBookingQueries.myHolds(), enabled: holdOpen }).data?.holds.find((h) => h.holdId !== holdId);
  useEffect(() => {
    // Once per hold, even when React runs effects twice in development.
    if (asked.current === holdId) return;
    asked.current = holdId;
    mutate(secret, { onSuccess: onClaimed });
  }, [holdId, secret, mutate, onClaimed]);

  if (holdOpen) {
    return (
      <div className="flex flex-col gap-3">
        <FormAlert>{claim.error.message}</FormAlert>
        <p>Resume booking to go back to that time (this new one is then released), or release that time to keep this one.</p>
        {other && (
          <OpenHoldCard
            hold={other}
            // Going back to the other time gives this one up, so nobody else is kept from it meanwhile.
            onResumed={(stored) => releaseThis.mutate({ holdId, secret }, { onSettled: () => onResumedOther(stored) })}
            onReleased={() => claim.mutate(secret, { onSuccess: onClaimed })}
          />
        )}
      </div>
    );
  }
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
