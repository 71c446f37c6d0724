import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Payments } from '@server/payments/payments';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { DeskCheckout } from '@shared/schemas/desk-checkout.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { formatMoney } from '@shared/money/money';
import { sendOnTime, type Senders } from '../messages';
import { lockBookingForMoney } from './booking-money.repository';
import { expireStoredCheckout, findOpenCheckout } from './checkout-sessions.repository';
import { cashBalanceOf, findDeskCheckout, insertBalancePayment, insertTipPayments, visitFacts } from './checkouts.repository';
import { deskCheckoutView } from './desk-checkout.service';
import { auditCheckout, completeDeskCheckout, tipWords } from './settle-balance.service';

/**
 * The client pays a checkout's card part in cash after all (the card was declined, or they would rather): in one
 * transaction, the rest of the balance and the tip are recorded as cash and the visit is checked out. The hosted page
 * is closed first, so it cannot be paid as well; a card payment the provider already took means 409 (its webhook
 * completes the checkout). With the payment service out of reach the cash is still taken: a card payment that gets
 * through later finds the checkout paid and is refunded in full (settleBalancePaid).
 */
export async function takeRestInCash(
  db: Kysely<Database>,
  deps: { payments: Payments; senders: Senders },
  user: SessionUser,
  bookingId: string,
  now: Date,
): Promise<DeskCheckout> {
  const messageIds = await db.transaction().execute(async (trx) => {
    // The checkout's row first, then the booking: the order the card part's webhook takes them in (it holds the
    // checkout, then marks the booking checked out), so the two meet at the checkout, one after the other, and
    // cannot deadlock.
    const desk = await findDeskCheckout(trx, bookingId, true);
    const booking = await lockBookingForMoney(trx, bookingId);
    if (!booking || booking.salonId !== user.salonId) throw notFound('That booking');
    if (!desk) throw new AppError('CONFLICT', 409, 'This visit has not been checked out yet.');
    if (desk.status !== 'open') throw new AppError('CONFLICT', 409, 'This checkout is paid already.');

    const page = await findOpenCheckout(trx, bookingId, 'balance');
    if (page?.providerSessionId) {
      const atProvider = await deps.payments.findCheckout(page.providerSessionId).catch(() => null);
      if (atProvider?.status === 'complete') {
        throw new AppError('CONFLICT', 409, 'The card payment has just gone through: the page shows it in a moment.');
      }
      await deps.payments.expireCheckout(page.providerSessionId).catch(() => undefined);
      await expireStoredCheckout(trx, page.providerSessionId);
    }

    const f = await visitFacts(trx, desk.salonId, bookingId);
    const cashBalance = await cashBalanceOf(trx, desk.id);
    const money = {
      salonId: desk.salonId,
      bookingId,
      clientId: f?.clientId ?? null,
      checkoutId: desk.id,
      currency: desk.currency,
      method: 'cash' as const,
      recordedBy: user.id,
    };
    const rest = desk.receipt.dueCents - cashBalance;
    if (rest > 0) {
      await insertBalancePayment(trx, money, rest);
      await auditCheckout(trx, desk, user.id, `the rest of the balance taken in cash instead of by card: ${formatMoney(rest, desk.currency)}`);
    }
    await insertTipPayments(trx, money, desk.receipt.tipShares);
    if (desk.receipt.tipCents > 0) await auditCheckout(trx, desk, user.id, tipWords(desk, 'cash', f?.stylists ?? []));
    return completeDeskCheckout(trx, desk, user.id, now);
  });
  for (const id of messageIds) await sendOnTime(db, deps.senders, id, now).catch(() => undefined);
  return deskCheckoutView(db, user, bookingId);
}
