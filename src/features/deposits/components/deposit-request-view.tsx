import type { PublicDeposit } from '@shared/schemas/payments.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { LoadingState } from '@client/components/ui/loading-state';
import { Notice } from '@client/components/ui/notice';
import { zoneLabel } from '@client/lib/time';
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
    <article aria-labelledby="deposit-heading" className="mx-auto flex w-full max-w-md flex-col gap-4 rounded-2xl bg-white p-5 shadow-sm ring-1 ring-ink/10">
      <p className="text-sm font-bold text-ink/80">{request.salonName}</p>
      <h1 id="deposit-heading" className="text-2xl font-extrabold tracking-tight">
        {request.clientName ? `${request.clientName.split(/\s+/)[0]}, your deposit` : 'Your deposit'}
      </h1>
      <dl className="grid grid-cols-[max-content_1fr] gap-x-4 gap-y-2">
        <dt className="font-bold">Service</dt>
        <dd>{request.serviceName}</dd>
        <dt className="font-bold">With</dt>
        <dd>{request.stylistName}</dd>
        <dt className="font-bold">When</dt>
        <dd>
          {formatDate(request.start, ctx, { width: 'short' })}, <span className="tabular">{formatTime(request.start, ctx)}</span>
          <span className="block text-sm text-ink/80">Salon time: {zoneLabel(request.timeZone, request.start.slice(0, 10))}</span>
        </dd>
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
      </dl>
      {body()}
    </article>
  );
}
