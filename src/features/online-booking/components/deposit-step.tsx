import type { BookingView } from '@shared/schemas/booking-view.schemas';
import type { Hold } from '@shared/schemas/online-booking.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { useIdempotencyKeys } from '@client/lib/use-idempotency-keys';
import { usePayHold } from '../api/hold-mutations';
import type { Card } from '../card-fields';
import { CardForm } from './card-form';
import { StepHeading } from './step-heading';
import { formatMoney } from '@shared/money/money';

type Props = { hold: Hold; secret: string; cancellationPolicy: string; focusOnMount: boolean; onBooked: (booking: BookingView) => void };

/**
 * Step 5: pay the deposit (or confirm when the service needs none). One key per
 * attempt, so a retried request after a lost answer never charges twice; a declined
 * card frees the key and the client can try another while the hold lasts.
 */
export function DepositStep({ hold, secret, cancellationPolicy, focusOnMount, onBooked }: Props) {
  const pay = usePayHold(hold.holdId);
  const keys = useIdempotencyKeys();
  const send = (card?: Card) =>
    pay.mutate(
      { secret, card, idempotencyKey: keys.keyFor('pay') },
      {
        onSuccess: (booking) => {
          keys.settle('pay');
          onBooked(booking);
        },
        onError: (error) => keys.settle('pay', error),
      },
    );
  // The server's answer already says what happened and what to do (a declined card: the time stays held, try another).
  const problem = pay.isError ? pay.error.message : null;

  return (
    <section className="flex flex-col gap-4">
      <StepHeading focusOnMount={focusOnMount}>Deposit</StepHeading>
      {hold.depositCents > 0 && (
        <p>
          The deposit for {hold.serviceName} is <span className="tabular">{formatMoney(hold.depositCents, hold.currency)}</span>: it secures your time and
          counts towards the price.
        </p>
      )}
      <p>{cancellationPolicy}</p>
      {hold.depositCents > 0 ? (
        <CardForm amount={formatMoney(hold.depositCents, hold.currency)} paying={pay.isPending} problem={problem} onPay={send} />
      ) : (
        <>
          <p className="font-bold">No deposit needed for this booking.</p>
          {problem && <FormAlert>{problem}</FormAlert>}
          <Button busy={pay.isPending} onClick={() => send()} className="w-full sm:w-auto sm:self-start">
            {pay.isPending ? 'Confirming…' : 'Confirm booking'}
          </Button>
        </>
      )}
    </section>
  );
}
