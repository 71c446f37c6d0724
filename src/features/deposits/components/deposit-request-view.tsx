import type { PublicDeposit } from '@shared/schemas/payments.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { LoadingState } from '@client/components/ui/loading-state';
import { Notice } from '@client/components/ui/notice';
import { LinkCard } from '@client/components/ui/link-card';
import { formatDate, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { formatMoney } from '@shared/money/money';
import { usePayDepositRequest } from '../api/deposit-mutations';

/** `returned`: back from the payment service's page, paid (`done`) or not (`cancelled`). */
type Props = { token: string; request: PublicDeposit; returned: 'done' | 'cancelled' | null };

/**
 * A deposit request as its link opens it (no sign-in; the token is the key): the booking, the deposit due, and one
 * button to the payment service's own page. Back from paying, it waits for the service's confirmation and says so.
 */
export function DepositRequestView({ token, request, returned }: Props) {
  const pay = usePayDepositRequest(token);
  const ctx = formatFor(request.timeZone);
  const due = request.open && request.deposit.dueCents > 0;
  const amount = formatMoney(request.deposit.dueCents, request.currency);
  const leaving = pay.isPending || pay.isSuccess;
  const body = () => {
    if (request.deposit.status === 'paid' || request.deposit.status === 'kept') {
      return <FormAlert tone="success">Your deposit is paid. Thank you: your booking is secured.</FormAlert>;
    }
    if (!request.open) return <p>This booking is no longer open for a deposit; nothing needs paying. Call the salon with any questions.</p>;
    if (!due) return <p>Nothing needs paying for this booking.</p>;
    if (returned === 'done') return <LoadingState label="Waiting for the payment to be confirmed…" />;
    return (
      <>
        {returned === 'cancelled' && (
          <Notice tone="info" title="The payment was cancelled">
            Nothing was charged. You can pay below when you are ready.
          </Notice>
        )}
        {pay.isError && <FormAlert>{pay.error.message}</FormAlert>}
        <p className="text-sm">You pay on the payment service&apos;s own secure page; your card details never reach the salon.</p>
        <Button
          busy={leaving}
          onClick={() => pay.mutate(undefined, { onSuccess: ({ checkoutUrl }) => checkoutUrl && window.location.assign(checkoutUrl) })}
          className="w-full"
        >
          {leaving ? 'Opening the payment page…' : `Pay deposit of ${amount}`}
        </Button>
      </>
    );
  };
  return (
    <LinkCard
      salonName={request.salonName}
      title={request.clientName ? `${request.clientName.split(/\s+/)[0]}, your deposit` : 'Your deposit'}
      visit={request}
      facts={
        <>
          <dt className="font-bold">Deposit</dt>
          <dd className="tabular">{formatMoney(request.depositCents, request.currency)}</dd>
          {due && request.deposit.dueBy && (
            <>
              <dt className="font-bold">Pay by</dt>
              <dd className="tabular">
                {formatTime(request.deposit.dueBy, ctx)}, {formatDate(request.deposit.dueBy, ctx, { width: 'short' })}
              </dd>
            </>
          )}
        </>
      }
    >
      {body()}
    </LinkCard>
  );
}
