import { useSuspenseQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import type { BookingPayments } from '@shared/schemas/payments.schemas';
import { Button } from '@client/components/ui/button';
import { FormAlert } from '@client/components/ui/form-alert';
import { SectionCard } from '@client/components/ui/section-card';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { formatDateTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { formatMoney, moneyInputText, parseMoney } from '@shared/money/money';
import { refundQueries, useRefund } from '../api/refund-queries';

type Props = { bookingId: string; timeZone: string };
type Payment = BookingPayments['payments'][number];

const KIND = { deposit: 'Deposit', balance: 'Paid at checkout', tip: 'Tip' } as const;
const how = (p: { method: 'card' | 'cash'; online?: boolean }) => (p.method === 'cash' ? 'cash' : p.online === false ? 'card terminal' : 'card');

/** A payment in the desk's words: "Deposit · card · $65.00", a tip with its stylist. */
function paymentLabel(p: Payment, money: (c: number) => string): string {
  return `${KIND[p.kind]}${p.stylistName ? ` for ${p.stylistName}` : ''} · ${how(p)} · ${money(p.amountCents)}`;
}

/**
 * A booking's money at the desk: every payment in with what is left to refund, every refund with its reason, and a
 * refund of all or part of one payment. A card payment made online goes back to the card through the payment
 * service; cash is handed back and a card-terminal payment refunded on the terminal, both recorded here.
 */
export function PaymentsPanel({ bookingId, timeZone }: Props) {
  const { data } = useSuspenseQuery(refundQueries.ofBooking(bookingId));
  const refund = useRefund(bookingId);
  const refundable = data.payments.filter((p) => p.leftCents > 0);
  const [paymentId, setPaymentId] = useState('');
  const [amount, setAmount] = useState('');
  const [reason, setReason] = useState('');
  const [amountError, setAmountError] = useState<string>();
  const ctx = formatFor(timeZone);
  const money = (cents: number) => formatMoney(cents, data.currency);
  const chosen = refundable.find((p) => p.id === paymentId) ?? refundable[0];
  if (data.payments.length === 0) return null;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!chosen) return;
    const cents = amount.trim() === '' ? chosen.leftCents : parseMoney(amount, data.currency);
    if (cents === null || cents <= 0) return setAmountError(`Enter an amount like ${moneyInputText(chosen.leftCents, data.currency)}`);
    setAmountError(undefined);
    refund.mutate(
      { paymentId: chosen.id, amountCents: cents, reason },
      {
        onSuccess: () => {
          setAmount('');
          setReason('');
        },
      },
    );
  };
  const fieldError = (refund.error as { fields?: Record<string, string> } | null)?.fields?.amountCents;

  return (
    <SectionCard title="Payments and refunds">
      <div className="flex flex-col gap-4">
        <ul aria-label="Payments" className="flex flex-col gap-1">
          {data.payments.map((p) => (
            <li key={p.id} className="rounded-lg bg-linen px-3 py-2">
              <span className="tabular">{formatDateTime(p.at, ctx, { year: false })}</span> · {paymentLabel(p, money)}
              {p.refundedCents > 0 && <span className="tabular"> · {money(p.refundedCents)} refunded</span>}
              {p.byName && ` · taken by ${p.byName}`}
            </li>
          ))}
        </ul>
        {data.refunds.length > 0 && (
          <ul aria-label="Refunds" className="flex flex-col gap-1">
            {data.refunds.map((r) => (
              <li key={r.id} className="rounded-lg bg-linen px-3 py-2">
                <span className="tabular">{formatDateTime(r.at, ctx, { year: false })}</span> · Refund of the {KIND[r.ofKind].toLowerCase()} ·{' '}
                {r.method === 'cash' ? 'cash' : r.status === 'pending' ? 'to the card, on its way' : 'to the card'} ·{' '}
                <span className="tabular font-bold">−{money(r.amountCents)}</span>
                {r.byName && ` · by ${r.byName}`}
                <span className="block text-sm text-ink/80">{r.reason}</span>
              </li>
            ))}
          </ul>
        )}
        {refund.isSuccess && <FormAlert tone="success">Refund recorded; the client is told.</FormAlert>}
        {refund.isError && !fieldError && <FormAlert>{refund.error.message}</FormAlert>}
        {chosen && (
          <form aria-label="Refund a payment" onSubmit={submit} className="grid gap-3 sm:grid-cols-2">
            <SelectField
              label="Payment"
              value={chosen.id}
              onChange={(e) => setPaymentId(e.target.value)}
              options={refundable.map((p) => ({ value: p.id, label: `${paymentLabel(p, money)} (${money(p.leftCents)} left)` }))}
            />
            <TextField
              label={`Amount (${data.currency})`}
              hint={`Empty: all ${money(chosen.leftCents)} left`}
              inputMode="decimal"
              value={amount}
              error={amountError ?? fieldError}
              onChange={(e) => setAmount(e.target.value)}
            />
            <TextField label="Reason" required maxLength={200} value={reason} onChange={(e) => setReason(e.target.value)} className="sm:col-span-2" />
            <div>
              <Button type="submit" variant="secondary" busy={refund.isPending}>
                Refund
              </Button>
            </div>
          </form>
        )}
      </div>
    </SectionCard>
  );
}
