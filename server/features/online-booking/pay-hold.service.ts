import type { Kysely } from 'kysely';
import type { z } from 'zod';
import type { Database } from '@server/db/schema';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { PayHoldSchema } from '@shared/schemas/online-booking.schemas';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import type { Payments } from '@server/payments/payments';
import type { Mailer } from '@server/mail/mailer';
import type { SmsSender } from '@server/sms/sms-sender';
import { AppError } from '@server/lib/app-error';
import { logger } from '@server/lib/logger';
import { findSalon } from '../salon';
import { writeAudit } from '../audit';
import { deskBookingView } from '../bookings';
import { holdCautions } from './hold-cautions';
import { confirmHoldRow, hasAcceptedCautions, recordPayment } from './holds.repository';
import { ownHold } from './holds.service';
import { sendConfirmation } from './confirmation';
import { assertHoldSkinTest } from './hold-skin-test';
import { formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

type Deps = { payments: Payments; mailer: Mailer; sms: SmsSender };

/**
 * Pays the deposit and turns the hold into a booking. The charge happens first (it may take a while); then,
 * in one statement, the hold becomes booked only if it is still held. A payment that arrives after the hold
 * lapsed is refunded at once, so money and bookings always agree. Answers the booking as it stands then.
 */
export async function payHold(
  db: Kysely<Database>,
  deps: Deps,
  user: SessionUser,
  id: string,
  body: z.infer<typeof PayHoldSchema>,
  now: Date,
): Promise<BookingView> {
  const hold = await ownHold(db, user, id, body.secret, now);
  const booking = () => deskBookingView(db, hold.salonId, hold.timeZone, hold.id);
  if (hold.status !== 'held') return booking(); // paid already (a retried request)
  const salon = await findSalon(db, hold.salonId);
  if (!(await hasAcceptedCautions(db, id, holdCautions(hold, salon).version))) {
    throw new AppError('CONFLICT', 409, 'Please read and accept the cautions first.');
  }
  if (hold.clientId) await assertHoldSkinTest(db, salon, hold, hold.clientId, now); // a reading may have come in since the claim
  const record = { salonId: salon.id, bookingId: id, clientId: hold.clientId, amountCents: hold.depositCents, currency: salon.currency };
  let paymentRef: string | null = null;
  if (hold.depositCents > 0) {
    if (!body.card) throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { card: 'Enter a card for the deposit.' });
    const charge = await deps.payments.charge({
      amountCents: hold.depositCents,
      currency: salon.currency,
      card: body.card,
      idempotencyKey: `deposit:${id}:${body.idempotencyKey}`,
      metadata: { booking: id },
    });
    // Payment lines carry the booking and the provider's payment id, never the card.
    const paymentLog = { bookingId: id, paymentRef: charge.paymentIntentId, amountCents: hold.depositCents };
    if (!charge.ok) {
      logger.info(paymentLog, 'deposit declined');
      await recordPayment(db, { ...record, providerRef: charge.paymentIntentId, status: 'declined', message: charge.message });
      const until = hold.heldUntil ? formatTime(hold.heldUntil, formatFor(hold.timeZone), { zoneName: true }) : 'the hold runs out';
      throw new AppError('PAYMENT_DECLINED', 402, `${charge.message} Your time stays held until ${until}; you can try another card.`);
    }
    logger.info(paymentLog, 'deposit charged');
    paymentRef = charge.paymentIntentId;
  }
  const booked = await confirmHoldRow(db, id, new Date());
  if (!booked) {
    if (paymentRef) {
      logger.info({ bookingId: id, paymentRef }, 'deposit refunded: the hold was no longer held');
      await deps.payments.refund(paymentRef, `refund:${paymentRef}`);
      await recordPayment(db, { ...record, providerRef: paymentRef, status: 'refunded', message: 'Paid after the hold lapsed' });
    }
    throw new AppError('HOLD_LAPSED', 409, 'The time was released before the payment arrived; your payment has been refunded. Please pick a time again.');
  }
  if (paymentRef) await recordPayment(db, { ...record, providerRef: paymentRef, status: 'succeeded' });
  await writeAudit(db, {
    salonId: salon.id,
    actorUserId: user.id,
    entity: 'booking',
    entityId: id,
    action: 'booked online',
    after: { status: 'booked', deposit: hold.depositCents },
  });
  await sendConfirmation(db, deps, id, new Date());
  return booking();
}
