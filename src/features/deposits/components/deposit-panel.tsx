import { useSuspenseQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import type { BookingStatus } from '@shared/schemas/common.schemas';
import type { DepositDetails } from '@shared/schemas/payments.schemas';
import { Button } from '@client/components/ui/button';
import { DepositBadge } from '@client/components/ui/deposit-badge';
import { FormAlert } from '@client/components/ui/form-alert';
import { SectionCard } from '@client/components/ui/section-card';
import { TextField } from '@client/components/ui/text-field';
import { formatDateTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { formatMoney } from '@shared/money/money';
import { useMarkDepositTaken, useRequestDeposit } from '../api/deposit-mutations';
import { depositQueries } from '../api/deposit-queries';

type Props = { bookingId: string; bookingStatus: BookingStatus; timeZone: string };
type Movement = DepositDetails['movements'][number];

/** How a movement of deposit money went, in the desk's words. */
function movementWords(m: Movement): string {
  if (m.kind === 'refund') return m.status === 'pending' ? 'Refund to the card, on its way' : 'Refunded to the card';
  if (m.method === 'cash') return 'Cash at the desk';
  return m.online ? 'Card, on the payment page' : 'Card terminal at the desk';
}

/**
 * A booking's deposit at the desk: where it stands, every payment and refund with who took it and when, the requests
 * sent, and while it is due, a request by SMS or e-mail (a link to the payment service's page) or "taken at the desk".
 */
export function DepositPanel({ bookingId, bookingStatus, timeZone }: Props) {
  const { data } = useSuspenseQuery(depositQueries.ofBooking(bookingId));
  const request = useRequestDeposit(bookingId);
  const taken = useMarkDepositTaken(bookingId);
  const [method, setMethod] = useState<'cash' | 'card'>('cash');
  const [note, setNote] = useState('');
  const ctx = formatFor(timeZone);
  const money = (cents: number) => formatMoney(cents, data.currency);
  const open = bookingStatus === 'booked' || bookingStatus === 'checked_in';
  const due = open && data.deposit.dueCents > 0;
  const submit = (event: FormEvent) => {
    event.preventDefault();
    taken.mutate({ method, note }, { onSuccess: () => setNote('') });
  };

  return (
    <SectionCard title="Deposit">
      <div className="flex flex-col gap-4">
        <p className="flex flex-wrap items-center gap-2">
          {data.depositCents > 0 ? <span className="tabular">Deposit of {money(data.depositCents)}</span> : 'No deposit is asked for this booking.'}
          <DepositBadge deposit={data.deposit} currency={data.currency} />
        </p>
        {due && data.deposit.dueBy && (
          <p>
            Unpaid, this booking is released at <span className="tabular">{formatDateTime(data.deposit.dueBy, ctx, { year: false })}</span> (the salon&apos;s
            setting).
          </p>
        )}
        {data.movements.length > 0 && (
          <ul aria-label="Deposit payments and refunds" className="flex flex-col gap-1">
            {data.movements.map((m) => (
              <li key={m.id} className="rounded-lg bg-linen px-3 py-2">
                <span className="tabular">{formatDateTime(m.at, ctx, { year: false })}</span> · {movementWords(m)} ·{' '}
                <span className="tabular font-bold">
                  {m.kind === 'refund' ? '−' : ''}
                  {money(m.amountCents)}
                </span>
                {m.byName && ` · taken by ${m.byName}`}
                {m.note && <span className="block text-sm text-ink/80">{m.note}</span>}
              </li>
            ))}
          </ul>
        )}
        {data.requests.length > 0 && (
          <ul aria-label="Deposit requests sent" className="flex flex-col gap-1 text-sm">
            {data.requests.map((r) => (
              <li key={r.at}>
                Requested {money(r.amountCents)} by {r.channel === 'sms' ? 'SMS' : 'e-mail'},{' '}
                <span className="tabular">{formatDateTime(r.at, ctx, { year: false })}</span>
                {r.byName && `, by ${r.byName}`}
              </li>
            ))}
          </ul>
        )}
        {request.isSuccess && <FormAlert tone="success">The request for {money(data.deposit.dueCents)} is on its way; the Outbox shows it.</FormAlert>}
        {request.isError && <FormAlert>{request.error.message}</FormAlert>}
        {taken.isError && <FormAlert>{taken.error.message}</FormAlert>}
        {due && (
          <div className="grid gap-5 lg:grid-cols-2">
            <div className="flex flex-col gap-2">
              <h3 className="font-bold">Ask the client to pay {money(data.deposit.dueCents)}</h3>
              <p className="text-sm">A link to the payment service&apos;s own page, where the client types their card.</p>
              <div className="flex flex-wrap gap-2">
                <Button variant="secondary" busy={request.isPending} disabled={!data.reach.sms} onClick={() => request.mutate('sms')}>
                  Send request by SMS
                </Button>
                <Button variant="secondary" busy={request.isPending} disabled={!data.reach.email} onClick={() => request.mutate('email')}>
                  Send request by e-mail
                </Button>
              </div>
              {!data.reach.sms && <p className="text-sm">No SMS: the client has no mobile number, or turned texts off.</p>}
              {!data.reach.email && <p className="text-sm">No e-mail: the client has no e-mail address.</p>}
            </div>
            <form aria-label="Deposit taken at the desk" onSubmit={submit} className="flex flex-col gap-2">
              <fieldset className="flex flex-col gap-1">
                <legend className="font-bold">Taken at the desk</legend>
                <div className="flex flex-wrap gap-x-5">
                  {(
                    [
                      ['cash', 'Cash'],
                      ['card', 'Card terminal'],
                    ] as const
                  ).map(([value, label]) => (
                    <label key={value} className="inline-flex min-h-11 items-center gap-2">
                      <input
                        type="radio"
                        name="method"
                        value={value}
                        checked={method === value}
                        onChange={() => setMethod(value)}
                        className="size-5 accent-oxide"
                      />
                      {label}
                    </label>
                  ))}
                </div>
              </fieldset>
              <TextField
                label="Note (optional)"
                hint="For example the terminal's receipt number."
                value={note}
                maxLength={200}
                onChange={(e) => setNote(e.target.value)}
              />
              <div>
                <Button type="submit" busy={taken.isPending}>
                  Mark {money(data.deposit.dueCents)} taken
                </Button>
              </div>
            </form>
          </div>
        )}
      </div>
    </SectionCard>
  );
}
