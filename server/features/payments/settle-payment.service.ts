import type { Db } from '@server/db/database';
import type { CheckoutSession, ProviderRefund } from '@server/payments/payments';
import type { BookingStatus } from '@shared/schemas/common.schemas';
import { refundBeyondDue } from '@shared/rules/deposit-state';
import { formatMoney } from '@shared/money/money';
import { writeAudit } from '../audit';
import { confirmHeld, depositMoneyOf } from '../bookings';
import { planClientMessage, replanBookingMessages } from '../messages';
import { findSalon } from '../salon';
import { lockBookingForMoney } from './booking-money.repository';
import { findCheckoutByProviderId, markCheckoutPaid, type StoredCheckout } from './checkout-sessions.repository';
import { completeRefund, findPaymentByProviderRef, insertCardPayment, insertRefund, lockPayment, refundedOf } from './payments.repository';
import { refundMessage, refundNotes, type RefundWhy } from './refund-words';
import { settleBalancePaid } from './settle-balance.service';

/** What is left to do once the transaction that settled a payment has committed. */
export interface AfterSettle {
  /** Refunds decided, to ask the provider for. */
  refundIds: string[];
  /** Messages planned for the client, to send now. */
  messageIds: string[];
  /** Held times that became bookings: their confirmations to send now. */
  bookedIds: string[];
}
export const nothingAfter = (): AfterSettle => ({ refundIds: [], messageIds: [], bookedIds: [] });

const RUNNING: readonly BookingStatus[] = ['booked', 'checked_in', 'finished'];

/**
 * A hosted page was paid (its webhook). The payment is recorded once; a held time still within its minutes becomes
 * a booking; whatever of the payment nobody owes (the hold lapsed first, the deposit was paid already, the booking is
 * over) is refunded once and the client told.
 */
export async function settleCheckoutPaid(trx: Db, session: CheckoutSession, now: Date): Promise<AfterSettle> {
  const recorded = await recordCheckoutPayment(trx, session);
  return recorded ? settlePayment(trx, recorded.checkout, recorded.paymentId, now) : nothingAfter();
}

/**
 * A refund made at the provider (its `refund.created`). One Dwell asked for completes its pending row; one made
 * there is recorded against its payment. A refund whose payment Dwell has not heard of yet (the events came out of
 * order) records that payment first from its session, then the refund, and only then settles the payment, so the
 * money already returned counts and nothing goes back twice.
 */
export async function settleProviderRefund(trx: Db, refund: ProviderRefund, sessionOfPayment: CheckoutSession | null, now: Date): Promise<AfterSettle> {
  if (refund.status !== 'succeeded' && refund.status !== 'pending') return nothingAfter(); // it moved nothing
  if (await findPaymentByProviderRef(trx, refund.id)) return nothingAfter();
  const ours = refund.metadata.dwell_refund;
  if (ours && /^[0-9a-f-]{36}$/.test(ours) && (await completeRefund(trx, ours, refund.id))) return nothingAfter();
  const known = await findPaymentByProviderRef(trx, refund.paymentIntentId);
  const recorded = known ? null : sessionOfPayment && (await recordCheckoutPayment(trx, sessionOfPayment));
  const paymentId = known?.id ?? recorded?.paymentId;
  if (!paymentId) return nothingAfter(); // a payment Dwell never took
  const payment = await lockPayment(trx, paymentId);
  await insertRefund(trx, {
    of: payment,
    amountCents: refund.amountMinor,
    status: 'succeeded',
    providerRef: refund.id,
    message: 'Refunded at the payment provider',
  });
  await auditMoney(
    trx,
    { id: payment.bookingId, salonId: payment.salonId },
    `refunded ${formatMoney(refund.amountMinor, payment.currency)} at the payment provider`,
  );
  return recorded ? settlePayment(trx, recorded.checkout, recorded.paymentId, now) : nothingAfter();
}

/** A movement of the booking's money in its history (the provider's doing: no person). */
function auditMoney(trx: Db, booking: { id: string; salonId: string }, action: string) {
  return writeAudit(trx, { salonId: booking.salonId, actorUserId: null, entity: 'booking', entityId: booking.id, action });
}

async function recordCheckoutPayment(trx: Db, session: CheckoutSession): Promise<{ checkout: StoredCheckout; paymentId: string } | null> {
  if (!session.paid || !session.paymentIntentId) return null;
  const checkout = await findCheckoutByProviderId(trx, session.id);
  if (!checkout) return null; // not a page Dwell opened
  await markCheckoutPaid(trx, checkout.id);
  const paymentId = await insertCardPayment(trx, {
    salonId: checkout.salonId,
    bookingId: checkout.bookingId,
    clientId: checkout.clientId,
    kind: checkout.kind,
    // What the provider charged, which is what Dwell asked for: the session was made from the server's amount.
    amountCents: session.amountMinor,
    currency: checkout.currency,
    providerRef: session.paymentIntentId,
    providerSessionId: session.id,
  });
  return paymentId ? { checkout, paymentId } : null; // null: recorded already (an event about it came first)
}

async function settlePayment(trx: Db, checkout: StoredCheckout, paymentId: string, now: Date): Promise<AfterSettle> {
  // A checkout's card part pays the visit's balance and tip, not a deposit.
  if (checkout.kind === 'balance') return settleBalancePaid(trx, checkout, paymentId, now);
  const after = nothingAfter();
  const booking = await lockBookingForMoney(trx, checkout.bookingId);
  const payment = await lockPayment(trx, paymentId);
  let running = booking !== undefined && RUNNING.includes(booking.status);
  const paid = formatMoney(payment.amountCents, payment.currency);
  if (running && booking) await auditMoney(trx, booking, `deposit paid on the payment page: ${paid}`);
  if (booking?.status === 'held' && (await confirmHeld(trx, booking.id, now))) {
    running = true;
    await writeAudit(trx, {
      salonId: booking.salonId,
      actorUserId: null,
      entity: 'booking',
      entityId: booking.id,
      action: 'booked online',
      after: { status: 'booked', deposit: payment.amountCents },
    });
    await replanBookingMessages(trx, booking.id, now); // the confirmation and reminders
    after.bookedIds.push(booking.id);
  }
  const money = await depositMoneyOf(trx, checkout.bookingId);
  const amount = refundBeyondDue({
    allowedCents: running && booking ? booking.depositCents : 0,
    netPaidCents: money.paidCents - money.refundedCents,
    thisPaymentLeftCents: payment.amountCents - (await refundedOf(trx, payment.id)),
  });
  if (amount <= 0) return after;
  const why: RefundWhy = running ? 'paid' : !booking || booking.status === 'held' ? 'late' : 'closed';
  const refundId = await insertRefund(trx, { of: payment, amountCents: amount, status: 'pending', providerRef: null, message: refundNotes[why] });
  after.refundIds.push(refundId);
  if (booking) await auditMoney(trx, booking, `refunded ${formatMoney(amount, payment.currency)} of a ${paid} payment: ${refundNotes[why].toLowerCase()}`);
  if (checkout.clientId) {
    const salon = await findSalon(trx, checkout.salonId);
    const message = refundMessage({
      salonId: salon.id,
      salonName: salon.name,
      clientId: checkout.clientId,
      refundId,
      why,
      amount: formatMoney(amount, payment.currency),
      what: checkout.description,
    });
    after.messageIds.push(...(await planClientMessage(trx, message, now)).map((m) => m.id));
  }
  return after;
}
