import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Db } from '@server/db/database';
import type { Payments } from '@server/payments/payments';
import { formatMoney } from '@shared/money/money';
import { logger } from '@server/lib/logger';
import { writeAudit } from '../audit';
import { lockBookingForMoney } from './booking-money.repository';
import { bookingPayments, insertRefund, lockPayment } from './payments.repository';
import { makePendingRefunds } from './refunds.service';
import { paymentWords } from './refund-words';

/**
 * The deposit policy's outcome as money, inside the transaction that decided it (a cancellation, a no-show), so the
 * outcome and its money are written together or not at all. Refunded: what is left of each deposit payment goes
 * back the way it came (to the card through the provider, written pending and made after the commit; cash and the
 * card terminal recorded as handed back). Kept: the money stays, and the history says so. The booking is locked and
 * only what is left is refunded, so deciding twice (two cancels at once, a retry) moves the money once.
 * Answers the refunds to ask the provider for once committed.
 */
export async function settleDepositOutcome(
  trx: Db,
  o: { bookingId: string; outcome: 'kept' | 'refunded' | null; actorUserId: string | null; why: string },
): Promise<string[]> {
  if (!o.outcome) return [];
  const booking = await lockBookingForMoney(trx, o.bookingId);
  if (!booking) return [];
  const deposits = (await bookingPayments(trx, o.bookingId)).filter((p) => p.kind === 'deposit');
  const audit = (action: string) => writeAudit(trx, { salonId: booking.salonId, actorUserId: o.actorUserId, entity: 'booking', entityId: booking.id, action });
  if (o.outcome === 'kept') {
    const kept = deposits.reduce((t, p) => t + p.amountCents - Number(p.refundedCents), 0);
    if (kept > 0 && deposits[0]) await audit(`deposit kept: ${formatMoney(kept, deposits[0].currency)} (${o.why})`);
    return [];
  }
  const pending: string[] = [];
  for (const d of deposits) {
    const left = d.amountCents - Number(d.refundedCents);
    if (left <= 0) continue;
    const payment = await lockPayment(trx, d.id);
    const online = payment.providerRef !== null;
    const id = await insertRefund(trx, {
      of: payment,
      amountCents: left,
      status: online ? 'pending' : 'succeeded',
      providerRef: null,
      message: `Deposit refunded: ${o.why}`,
      recordedBy: o.actorUserId,
    });
    if (online) pending.push(id);
    const how = payment.method === 'cash' ? ', to be handed back in cash' : online ? ' to the card' : ' on the card terminal';
    await audit(`deposit refunded${how}: ${formatMoney(left, payment.currency)} of the ${paymentWords(payment)} (${o.why})`);
  }
  return pending;
}

/** Refunds decided and not made yet asked for now (after the commit that decided them); the job retries any that fail. */
export async function makeDecidedRefunds(db: Kysely<Database>, payments: Payments): Promise<void> {
  await makePendingRefunds(db, payments).catch((err: Error) => logger.warn({ err: err.message }, 'payments: refunds left for the next pass'));
}
