import type { ClientMessage } from '../messages';
import { formatMoney } from '@shared/money/money';

/** Why Dwell sends (part of) a payment back: the held time lapsed first, the deposit was paid already, or the booking is over. */
export type RefundWhy = 'late' | 'paid' | 'closed';

export const refundNotes: Record<RefundWhy, string> = {
  late: 'Paid after the held time was released',
  paid: 'Paid when the deposit was already paid',
  closed: 'Paid after the booking was cancelled',
};

/** The client is told through the send log, once per refund (its key), on the channels they chose. */
export function refundMessage(r: {
  salonId: string;
  salonName: string;
  clientId: string;
  refundId: string;
  why: RefundWhy;
  amount: string;
  what: string;
}): ClientMessage {
  const reason = {
    late: `your ${r.amount} payment (${r.what}) came after your held time was released, so it is refunded in full. Please pick a time again.`,
    paid: `your deposit was already paid, so ${r.amount} of your payment (${r.what}) is refunded.`,
    closed: `your booking was cancelled before your payment (${r.what}) arrived, so ${r.amount} is refunded.`,
  }[r.why];
  return {
    salonId: r.salonId,
    clientId: r.clientId,
    kind: 'payment_refunded',
    key: `payment-refunded:${r.refundId}`,
    subject: `${r.salonName}: your payment is refunded`,
    email: `Hello,\n\nAt ${r.salonName}, ${reason}\n\nThe refund goes back to the card you paid with.\n`,
    sms: `${r.salonName}: ${reason} It goes back to your card.`,
  };
}

const KIND_WORDS = { deposit: 'deposit', balance: 'payment at checkout', tip: 'tip', refund: 'refund' } as const;

/** A payment in the booking's history: "$65.00 deposit (card, online)". */
export function paymentWords(p: {
  kind: keyof typeof KIND_WORDS;
  method: 'card' | 'cash';
  providerRef: string | null;
  amountCents: number;
  currency: string;
}): string {
  const how = p.method === 'cash' ? 'cash' : p.providerRef ? 'card, online' : 'card terminal';
  return `${formatMoney(p.amountCents, p.currency)} ${KIND_WORDS[p.kind]} (${how})`;
}

/** A refund the desk made, told to the client once (its key): how much, of what, and where the money goes back. */
export function deskRefundMessage(
  salon: { id: string; name: string },
  clientId: string,
  refundId: string,
  payment: { kind: keyof typeof KIND_WORDS; method: 'card' | 'cash' },
  amount: string,
): ClientMessage {
  const where = payment.method === 'cash' ? 'It is handed back to you in cash at the salon.' : 'It goes back to the card you paid with.';
  const text = `${salon.name} has refunded ${amount} of your ${KIND_WORDS[payment.kind]}. ${where}`;
  return {
    salonId: salon.id,
    clientId,
    kind: 'payment_refunded',
    key: `payment-refunded:${refundId}`,
    subject: `${salon.name}: ${amount} refunded`,
    email: `Hello,\n\n${text}\n`,
    sms: text,
  };
}
