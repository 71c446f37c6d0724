import type { Hold } from '@shared/schemas/online-booking.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { Notice } from '@client/components/ui/notice';
import { formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { formatMoney } from '@shared/money/money';
import { usePayHold } from '../api/hold-mutations';
import { StepHeading } from './step-heading';

type Props = {
  hold: Hold;
  secret: string;
  cancellationPolicy: string;
  focusOnMount: boolean;
  /** The client came back from the payment page without paying. */
  cancelled: boolean;
  /** Booked at once (no deposit, or paid already). */
  onBooked: () => void;
};

/**
 * Step 5: pay the deposit on the payment service's own page (the card is typed there, never into Dwell), or confirm
 * when the service needs none. Every tab and retry is sent to the same page, so the deposit is charged once.
 */
export function DepositStep({ hold, secret, cancellationPolicy, focusOnMount, cancelled, onBooked }: Props) {
  const pay = usePayHold(hold.holdId);
  const send = () =>
    pay.mutate(secret, {
      onSuccess: ({ checkoutUrl }) => {
        if (checkoutUrl) window.location.assign(checkoutUrl);
        else onBooked();
      },
    });
  const amount = formatMoney(hold.depositCents, hold.currency);
  const until = hold.heldUntil ? formatTime(hold.heldUntil, formatFor(hold.timeZone), { zoneName: true }) : null;
  // Leaving for the payment page: the button stays busy until the browser has gone.
  const leaving = pay.isPending || (pay.isSuccess && pay.data.checkoutUrl !== null);

  return (
    <section className="flex flex-col gap-4">
      <StepHeading focusOnMount={focusOnMount}>Deposit</StepHeading>
      {cancelled && (
        <Notice tone="info" title="The payment was cancelled">
          Nothing was charged.{until && ` Your time stays held until ${until}.`} You can pay again below.
        </Notice>
      )}
      {hold.depositCents > 0 && (
        <p>
          The deposit for {hold.serviceName} is <span className="tabular">{amount}</span>: it secures your time and counts towards the price.
        </p>
      )}
      <p>{cancellationPolicy}</p>
      {pay.isError && <FormAlert>{pay.error.message}</FormAlert>}
      {hold.depositCents > 0 ? (
        <>
          <p className="rounded-lg bg-white px-3 py-2 text-sm ring-1 ring-ink/10">
            You pay on the payment service&apos;s own secure page, then come back here; your card details never reach the salon. This demo uses a local test
            payment service, not a real bank: its page lists the test cards.
          </p>
          <Button busy={leaving} onClick={send} className="w-full sm:w-auto sm:self-start">
            {leaving ? 'Opening the payment page…' : `Pay deposit of ${amount}`}
          </Button>
        </>
      ) : (
        <>
          <p className="font-bold">No deposit needed for this booking.</p>
          <Button busy={pay.isPending} onClick={send} className="w-full sm:w-auto sm:self-start">
            {pay.isPending ? 'Confirming…' : 'Confirm booking'}
          </Button>
        </>
      )}
    </section>
  );
}
