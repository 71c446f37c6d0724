import type { Db } from '@server/db/database';
import { formatMoney } from '@shared/money/money';
import { writeAudit } from '../audit';
import { planClientMessage } from '../messages';
import type { StoredCheckout } from './checkout-sessions.repository';
import {
  cashBalanceOf,
  checkoutPayments,
  claimCardPayment,
  findDeskCheckout,
  insertTipPayments,
  markDeskCheckoutPaid,
  setBookingCheckedOut,
  visitFacts,
  type StoredDeskCheckout,
} from './checkouts.repository';
import { insertRefund, lockPayment } from './payments.repository';
import { receiptMessage } from './receipt-words';
import { nothingAfter, type AfterSettle } from './settle-payment.service';

const methodWords = { card: 'card', cash: 'cash' } as const;

/** A change to the booking's money in its history; `actor` null when the payment provider's webhook made it. */
export function auditCheckout(trx: Db, c: { salonId: string; bookingId: string }, actor: string | null, action: string) {
  return writeAudit(trx, { salonId: c.salonId, actorUserId: actor, entity: 'booking', entityId: c.bookingId, action });
}

/**
 * The checkout is paid in full: it is marked paid, the booking becomes checked out, the history says how it was paid,
 * and the receipt is planned by e-mail (its id answered, to send once committed).
 */
export async function completeDeskCheckout(trx: Db, c: StoredDeskCheckout, actor: string | null, now: Date): Promise<string[]> {
  await markDeskCheckoutPaid(trx, c.id, now);
  await setBookingCheckedOut(trx, c.bookingId);
  const paid = await checkoutPayments(trx, c.id);
  const by = [...new Set(paid.map((p) => methodWords[p.method]))];
  const paidBy = by.length === 0 ? 'the deposit' : by.join(' and ');
  await auditCheckout(trx, c, actor, `checked out: ${formatMoney(c.receipt.totalCents, c.currency)} total, paid by ${paidBy}`);
  const f = await visitFacts(trx, c.salonId, c.bookingId);
  if (!f?.clientId || !f.clientEmail) return [];
  const message = receiptMessage({
    salonId: c.salonId,
    salonName: f.salonName,
    clientId: f.clientId,
    checkoutId: c.id,
    serviceName: f.serviceName,
    receipt: c.receipt,
    paidBy,
    stylistName: (id) => f.stylists.find((s) => s.id === id)?.name ?? 'your stylist',
  });
  return (await planClientMessage(trx, message, now)).map((m) => m.id);
}

/** The tip rows' words in the history: "tip $10.00 by card: Ana $5.00, Lee $5.00". */
export function tipWords(c: StoredDeskCheckout, method: 'card' | 'cash', names: { id: string; name: string }[]): string {
  const shares = c.receipt.tipShares.map((s) => `${names.find((n) => n.id === s.stylistId)?.name ?? 'a stylist'} ${formatMoney(s.cents, c.currency)}`);
  return `tip ${formatMoney(c.receipt.tipCents, c.currency)} by ${method}: ${shares.join(', ')}`;
}

/**
 * The card part of a checkout was paid on the hosted page (its webhook, once). The provider's charge was recorded as
 * one card row; it becomes the balance part with one tip row per stylist beside it, and the checkout is complete. A
 * charge nobody owes (the checkout was settled otherwise, or is for another amount) is refunded in full.
 */
export async function settleBalancePaid(trx: Db, session: StoredCheckout, paymentId: string, now: Date): Promise<AfterSettle> {
  const after = nothingAfter();
  const desk = await findDeskCheckout(trx, session.bookingId, true);
  const payment = await lockPayment(trx, paymentId);
  const cashBalance = desk ? await cashBalanceOf(trx, desk.id) : 0;
  const owed = desk && desk.status === 'open' ? desk.dueCents - cashBalance : 0;
  if (!desk || owed !== payment.amountCents) {
    const refundId = await insertRefund(trx, {
      of: payment,
      amountCents: payment.amountCents,
      status: 'pending',
      providerRef: null,
      message: 'Paid when the visit was already paid',
    });
    after.refundIds.push(refundId);
    await auditCheckout(
      trx,
      session,
      null,
      `refunded ${formatMoney(payment.amountCents, payment.currency)}: paid on the payment page when the visit was already paid`,
    );
    return after;
  }
  const f = await visitFacts(trx, desk.salonId, desk.bookingId);
  const balanceCents = desk.receipt.dueCents - cashBalance;
  const money = {
    salonId: desk.salonId,
    bookingId: desk.bookingId,
    clientId: session.clientId,
    checkoutId: desk.id,
    currency: desk.currency,
    method: 'card' as const,
    recordedBy: null,
  };
  const [first, ...others] = desk.receipt.tipShares.filter((s) => s.cents > 0);
  if (balanceCents > 0 || !first) {
    await claimCardPayment(trx, payment.id, desk.id, { balanceCents });
    await insertTipPayments(trx, money, desk.receipt.tipShares);
    await auditCheckout(trx, desk, null, `balance paid by card on the payment page: ${formatMoney(balanceCents, desk.currency)}`);
  } else {
    await claimCardPayment(trx, payment.id, desk.id, { tipOf: first.stylistId, cents: first.cents });
    await insertTipPayments(trx, money, others);
  }
  if (desk.receipt.tipCents > 0) await auditCheckout(trx, desk, null, tipWords(desk, 'card', f?.stylists ?? []));
  after.messageIds.push(...(await completeDeskCheckout(trx, desk, null, now)));
  return after;
}
