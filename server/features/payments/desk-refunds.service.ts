import type { Kysely } from 'kysely';
import type { z } from 'zod';
import type { Database } from '@server/db/schema';
import type { Payments } from '@server/payments/payments';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { BookingPayments, RefundBodySchema } from '@shared/schemas/payments.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { formatMoney } from '@shared/money/money';
import { writeAudit } from '../audit';
import { planClientMessage, sendOnTime, type Senders } from '../messages';
import { findSalon } from '../salon';
import { lockBookingForMoney } from './booking-money.repository';
import { bookingPayments, bookingRefunds, insertRefund, lockPayment, refundedOf } from './payments.repository';
import { makePendingRefunds } from './refunds.service';
import { deskRefundMessage, paymentWords } from './refund-words';

/** A booking's payments in, what each can still refund, and its refunds (404 outside the caller's salon). */
export async function bookingMoney(db: Kysely<Database>, user: SessionUser, bookingId: string): Promise<BookingPayments> {
  const salon = await findSalon(db, user.salonId);
  const booking = await lockBookingForMoney(db, bookingId); // a read on its own: the lock ends with it
  if (!booking || booking.salonId !== salon.id) throw notFound('That booking');
  const [paid, refunds] = await Promise.all([bookingPayments(db, bookingId), bookingRefunds(db, bookingId)]);
  return {
    bookingId,
    currency: salon.currency,
    payments: paid.map((p) => ({
      id: p.id,
      kind: p.kind === 'refund' ? 'deposit' : p.kind, // never: refunds are listed apart
      method: p.method,
      online: p.providerRef !== null,
      amountCents: p.amountCents,
      refundedCents: Number(p.refundedCents),
      leftCents: p.amountCents - Number(p.refundedCents),
      at: p.at.toISOString(),
      byName: p.byName,
      stylistName: p.stylistName,
    })),
    refunds: refunds.map((r) => ({
      id: r.id,
      refundOf: r.refundOf!, // a refund always names its payment (payments_refund_names_payment)
      ofKind: r.ofKind === 'refund' ? 'deposit' : r.ofKind,
      method: r.method,
      amountCents: r.amountCents,
      status: r.status === 'pending' ? 'pending' : 'succeeded',
      reason: r.reason,
      at: r.at.toISOString(),
      byName: r.byName,
    })),
  };
}

/**
 * A refund the desk or the owner makes: all or part of one payment, with a reason. The payment is locked while what
 * is left of it is read and the refund written, so refunds made at the same moment queue and together never return
 * more than was paid. A card payment made through the provider is refunded through it (written pending, made after
 * the commit under the refund's own idempotency key); cash goes back as cash and a card-terminal payment on the
 * terminal, both recorded as made. The booking's history says it in words and the client is told.
 */
export async function refundPayment(
  db: Kysely<Database>,
  deps: { payments: Payments; senders: Senders },
  user: SessionUser,
  bookingId: string,
  body: z.output<typeof RefundBodySchema>,
  now: Date,
): Promise<BookingPayments> {
  const salon = await findSalon(db, user.salonId);
  const done = await db.transaction().execute(async (trx) => {
    const booking = await lockBookingForMoney(trx, bookingId);
    if (!booking || booking.salonId !== salon.id) throw notFound('That booking');
    const payment = await lockPayment(trx, body.paymentId).catch(() => undefined);
    if (!payment || payment.bookingId !== bookingId || payment.kind === 'refund' || payment.status !== 'succeeded') throw notFound('That payment');
    const leftCents = payment.amountCents - (await refundedOf(trx, payment.id));
    const asked = formatMoney(body.amountCents, payment.currency);
    if (body.amountCents > leftCents) {
      const left = formatMoney(leftCents, payment.currency);
      const message = `A refund of ${asked} is more than the ${left} left of this ${formatMoney(payment.amountCents, payment.currency)} payment.`;
      throw new AppError('VALIDATION_FAILED', 400, message, { amountCents: message });
    }
    const online = payment.providerRef !== null;
    const refundId = await insertRefund(trx, {
      of: payment,
      amountCents: body.amountCents,
      status: online ? 'pending' : 'succeeded',
      providerRef: null,
      message: body.reason,
      recordedBy: user.id,
    });
    await writeAudit(trx, {
      salonId: salon.id,
      actorUserId: user.id,
      entity: 'booking',
      entityId: bookingId,
      action: `refunded ${asked} of the ${paymentWords(payment)}: ${body.reason}`,
    });
    const planned = booking.clientId ? await planClientMessage(trx, deskRefundMessage(salon, booking.clientId, refundId, payment, asked), now) : [];
    return { refundId: online ? refundId : null, messageIds: planned.map((m) => m.id) };
  });
  // Committed: the provider is asked now (the make-pending-refunds job asks again if it is down), the client told.
  if (done.refundId) await makePendingRefunds(db, deps.payments, [done.refundId]);
  for (const id of done.messageIds) await sendOnTime(db, deps.senders, id, now).catch(() => undefined);
  return bookingMoney(db, user, bookingId);
}
