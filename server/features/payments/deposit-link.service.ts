import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Payments } from '@server/payments/payments';
import type { CheckoutAnswer, PublicDeposit } from '@shared/schemas/payments.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { sha256 } from '@server/lib/hash';
import { sittingAhead } from '@shared/rules/deposit-state';
import { deskBookingView } from '../bookings';
import { findSalon } from '../salon';
import { openCheckout } from './checkout.service';
import { findDepositRequest } from './deposit-requests.repository';

/** A link's payment page stays open up to a day (the longest the provider keeps one). */
const LINK_PAGE_HOURS = 24;

async function requested(db: Kysely<Database>, token: string) {
  const request = await findDepositRequest(db, sha256(token));
  if (!request) throw notFound('That deposit request');
  const salon = await findSalon(db, request.salonId);
  return { salon, booking: await deskBookingView(db, salon.id, salon.timeZone, request.bookingId) };
}

/** A deposit request as its link shows it: the booking, the deposit and what is still due. */
export async function viewDepositRequest(db: Kysely<Database>, token: string, now: Date): Promise<PublicDeposit> {
  const { salon, booking } = await requested(db, token);
  return {
    salonName: salon.name,
    clientName: booking.client.name,
    serviceName: booking.service.name,
    stylistName: booking.stylist.name,
    start: sittingAhead(booking.sittings, now)!.start, // every booking has a sitting
    timeZone: salon.timeZone,
    currency: salon.currency,
    depositCents: booking.depositCents,
    deposit: booking.deposit,
    open: booking.status === 'booked' || booking.status === 'checked_in',
  };
}

/**
 * Opens (or reuses) the hosted payment page for what is due now. Whatever the page or its return address says, the
 * amount is the server's: the deposit due at this moment.
 */
export async function payDepositRequest(db: Kysely<Database>, payments: Payments, token: string, baseUrl: string, now: Date): Promise<CheckoutAnswer> {
  const { salon, booking } = await requested(db, token);
  if (booking.status !== 'booked' && booking.status !== 'checked_in') throw new AppError('NOT_BOOKABLE', 409, 'This booking is no longer open for a deposit.');
  if (booking.deposit.dueCents <= 0) throw new AppError('CONFLICT', 409, 'Nothing to pay: the deposit is paid.');
  const back = `${baseUrl}/deposit/${token}`;
  const checkoutUrl = await openCheckout(
    db,
    payments,
    {
      salonId: salon.id,
      bookingId: booking.id,
      clientId: booking.client.id,
      kind: 'deposit',
      amountCents: booking.deposit.dueCents,
      currency: salon.currency,
      description: `Deposit for ${booking.service.name} at ${salon.name}`,
      successUrl: `${back}?payment=done`,
      cancelUrl: `${back}?payment=cancelled`,
      expiresAt: new Date(now.getTime() + LINK_PAGE_HOURS * 3_600_000),
    },
    now,
  );
  return { checkoutUrl };
}
