import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import { WebhookSignatureError, type PaymentEvent, type Payments } from '@server/payments/payments';
import { AppError } from '@server/lib/app-error';
import { sendDueNow, sendOnTime, type Senders } from '../messages';
import { recordEvent } from './payment-events.repository';
import { expireStoredCheckout } from './checkout-sessions.repository';
import { findPaymentByProviderRef } from './payments.repository';
import { makePendingRefunds } from './refunds.service';
import { nothingAfter, settleCheckoutPaid, settleProviderRefund, type AfterSettle } from './settle-payment.service';

/** How long the webhook's answer waits for a new booking's confirmation to go out (the provider waits for the answer). */
const CONFIRMATION_WAIT_MS = 2_000;

/**
 * The payment provider's webhook. The signature over the raw body is checked first: a forged or altered request is a
 * 400 and changes nothing. Each event is handled once (its id is stored in the same transaction as what it changes);
 * a payment is recorded once whichever event brings it; anything handled twice answers `duplicate`.
 */
export async function receivePaymentWebhook(
  db: Kysely<Database>,
  deps: { payments: Payments; senders: Senders },
  rawBody: Buffer,
  signature: string | undefined,
  now: Date,
): Promise<{ received: true; duplicate: boolean }> {
  let event: PaymentEvent;
  try {
    event = deps.payments.readEvent(Buffer.isBuffer(rawBody) ? rawBody : Buffer.alloc(0), signature);
  } catch (err) {
    if (err instanceof WebhookSignatureError) throw new AppError('BAD_SIGNATURE', 400, 'The webhook is not signed by the payment provider.');
    throw err;
  }
  // A refund names only its payment: when Dwell has not recorded that payment yet, its session is read now, outside
  // the transaction (the provider's answer may take a while).
  const sessionOfPayment =
    event.type === 'refund.created' || event.type === 'refund.updated'
      ? (await findPaymentByProviderRef(db, event.refund.paymentIntentId))
        ? null
        : await deps.payments.checkoutOfPayment(event.refund.paymentIntentId)
      : null;
  const after = await db.transaction().execute(async (trx): Promise<AfterSettle | null> => {
    const providerType = event.type === 'other' ? event.providerType : event.type;
    if (!(await recordEvent(trx, { eventId: event.id, type: providerType, objectId: event.objectId }))) return null;
    switch (event.type) {
      case 'checkout.session.completed':
        return settleCheckoutPaid(trx, event.session, now);
      case 'checkout.session.expired':
        await expireStoredCheckout(trx, event.session.id);
        return nothingAfter();
      case 'refund.created':
      case 'refund.updated':
        return settleProviderRefund(trx, event.refund, sessionOfPayment, now);
      default:
        return nothingAfter();
    }
  });
  if (!after) return { received: true, duplicate: true };
  // Committed: now the provider is asked for refunds and the client told (either retried by the jobs when they fail).
  await makePendingRefunds(db, deps.payments, after.refundIds);
  for (const id of after.messageIds) await sendOnTime(db, deps.senders, id, now).catch(() => undefined);
  for (const id of after.bookedIds) await sendDueNow(db, deps.senders, id, now, CONFIRMATION_WAIT_MS);
  return { received: true, duplicate: false };
}
