import { useEffect, useRef, useState } from 'react';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { problemText } from '@client/lib/api-error';
import { useTakeRestInCash } from '../api/desk-checkout-mutations';

type Props = { bookingId: string; amount: string };

/**
 * The card part taken in cash after all (a declined card, a change of mind). It asks first, since it closes the
 * client's payment page; focus goes to "Keep the card page", so a second Enter cannot take it by accident.
 */
export function RestInCash({ bookingId, amount }: Props) {
  const take = useTakeRestInCash(bookingId);
  const [asking, setAsking] = useState(false);
  const keepRef = useRef<HTMLButtonElement>(null);
  useEffect(() => {
    if (asking) keepRef.current?.focus();
  }, [asking]);
  return (
    <div className="flex flex-col gap-2">
      {asking ? (
        <div role="group" aria-label="Take the card part in cash?" className="flex flex-col gap-2 rounded-xl bg-linen p-3">
          <p className="font-bold">Take {amount} in cash and close the payment page?</p>
          <div className="flex flex-wrap gap-2">
            <Button variant="secondary" busy={take.isPending} onClick={() => take.mutate()}>
              Yes, {amount} in cash
            </Button>
            <Button ref={keepRef} variant="quiet" onClick={() => setAsking(false)}>
              Keep the card page
            </Button>
          </div>
        </div>
      ) : (
        <Button variant="secondary" onClick={() => setAsking(true)}>
          Take it in cash instead
        </Button>
      )}
      {take.error && <FormAlert>{problemText(take.error)}</FormAlert>}
    </div>
  );
}
