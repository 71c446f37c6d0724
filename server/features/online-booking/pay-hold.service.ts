import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { CheckoutAnswer } from '@shared/schemas/payments.schemas';
import type { Payments } from '@server/payments/payments';
import type { Mailer } from '@server/mail/mailer';
import type { SmsSender } from '@server/sms/sms-sender';
import { AppError } from '@server/lib/app-error';
import { logger } from '@server/lib/logger';
import { findSalon } from '../salon';
import { writeAudit } from '../audit';
import { confirmHeld } from '../bookings';
import { openCheckout } from '../payments';
import { holdCautions } from './hold-cautions';
import { hasAcceptedCautions } from './holds.repository';
import { holdLapsed } from './hold-view';
import { ownHold } from './holds.service';
import { sendConfirmation } from './confirmation';
import { assertHoldSkinTest } from './hold-skin-test';

type Deps = { payments: Payments; mailer: Mailer; sms: SmsSender };

/**
 * The payment provider keeps a hosted page open at least 30 minutes; a hold's page is opened for a little more, and a
 * payment that arrives after the hold lapsed is refunded (the webhook decides).
 */
const HOLD_PAGE_MINUTES = 31;

/**
 * Pays a held time's deposit on the payment provider's hosted page: answers where to send the client, the same page
 * for every tab and retry (one per hold and amount). The card never reaches Dwell; the provider's signed webhook
 * turns the hold into a booking (payment-webhook.service.ts). A hold with no deposit is booked at once (no page).
 */
export async function payHold(
  db: Kysely<Database>,
  deps: Deps,
  user: SessionUser,
  id: string,
  secret: string,
  baseUrl: string,
  now: Date,
): Promise<CheckoutAnswer> {
  const hold = await ownHold(db, user, id, secret, now);
  if (hold.status !== 'held') return { checkoutUrl: null }; // booked already (the webhook came, or another tab)
  const salon = await findSalon(db, hold.salonId);
  if (!(await hasAcceptedCautions(db, id, holdCautions(hold, salon).version))) {
    throw new AppError('CONFLICT', 409, 'Please read and accept the cautions first.');
  }
  if (hold.clientId) await assertHoldSkinTest(db, salon, hold, hold.clientId, now); // a reading may have come in since the claim
  if (hold.depositCents <= 0) {
    if (!(await confirmHeld(db, id, now))) throw holdLapsed();
    await writeAudit(db, {
      salonId: salon.id,
      actorUserId: user.id,
      entity: 'booking',
      entityId: id,
      action: 'booked online',
      after: { status: 'booked', deposit: 0 },
    });
    await sendConfirmation(db, deps, id, now);
    return { checkoutUrl: null };
  }
  const checkoutUrl = await openCheckout(
    db,
    deps.payments,
    {
      salonId: salon.id,
      bookingId: id,
      clientId: hold.clientId,
      kind: 'deposit',
      amountCents: hold.depositCents,
      currency: salon.currency,
      description: `Deposit for ${hold.serviceName} at ${salon.name}`,
      // The return page waits for the webhook; cancelling goes back to the deposit step of this hold.
      successUrl: `${baseUrl}/me/holds/${id}/paid`,
      cancelUrl: `${baseUrl}/salon/${hold.salonSlug}/book?service=${hold.serviceId}&payment=cancelled`,
      expiresAt: new Date(now.getTime() + HOLD_PAGE_MINUTES * 60_000),
    },
    now,
  );
  // Payment lines carry the booking, never the card: the card is typed on the provider's page, not here.
  logger.info({ bookingId: id, amountCents: hold.depositCents }, 'deposit checkout opened');
  return { checkoutUrl };
}
