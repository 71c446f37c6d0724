import { randomBytes } from 'node:crypto';
import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Payments } from '@server/payments/payments';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { DepositDetails } from '@shared/schemas/payments.schemas';
import type { Salon } from '@shared/schemas/salon.schemas';
import type { z } from 'zod';
import type { DepositTakenBodySchema } from '@shared/schemas/payments.schemas';
import { AppError } from '@server/lib/app-error';
import { sha256 } from '@server/lib/hash';
import { formatMoney } from '@shared/money/money';
import { sittingAhead } from '@shared/rules/deposit-state';
import { formatDateTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { writeAudit } from '../audit';
import { deskBookingView } from '../bookings';
import { findClient } from '../clients';
import { planClientMessage, sendOnTime, type Senders } from '../messages';
import { findSalon } from '../salon';
import { lockBookingForMoney } from './booking-money.repository';
import { findOpenCheckout } from './checkout-sessions.repository';
import { retireCheckout } from './checkout.service';
import { depositRequestMessage } from './deposit-request-words';
import { depositRequestsOf, insertDepositRequest } from './deposit-requests.repository';
import { depositMovements, insertDeskPayment } from './payments.repository';

/** A booking's deposit as the desk sees it: where it stands, each payment and refund, the requests sent, how to reach the client. */
export async function depositDetails(db: Kysely<Database>, user: SessionUser, bookingId: string): Promise<DepositDetails> {
  return detailsIn(db, await findSalon(db, user.salonId), bookingId);
}

async function detailsIn(db: Kysely<Database>, salon: Salon, bookingId: string): Promise<DepositDetails> {
  const view = await deskBookingView(db, salon.id, salon.timeZone, bookingId); // 404 outside the caller's salon
  const [movements, requests, client] = await Promise.all([
    depositMovements(db, bookingId),
    depositRequestsOf(db, bookingId),
    findClient(db, salon.id, view.client.id),
  ]);
  return {
    bookingId,
    currency: salon.currency,
    depositCents: view.depositCents,
    deposit: view.deposit,
    movements: movements.map((m) => ({
      id: m.id,
      kind: m.kind === 'refund' ? 'refund' : 'deposit',
      method: m.method,
      online: (m.kind === 'refund' ? m.refundOfRef : m.providerSessionId) !== null,
      amountCents: m.amountCents,
      status: m.status === 'pending' ? 'pending' : 'succeeded',
      at: m.at.toISOString(),
      byName: m.byName,
      note: m.note,
    })),
    requests: requests.map((r) => ({ channel: r.channel, amountCents: r.amountCents, at: r.at.toISOString(), byName: r.byName })),
    reach: { sms: Boolean(client?.phone && !client.smsStoppedAt), email: Boolean(client?.email) },
  };
}

/** What may still be asked of a booking: its deposit due, while it is booked or under way. */
async function dueOf(db: Kysely<Database>, salon: Salon, bookingId: string) {
  const view = await deskBookingView(db, salon.id, salon.timeZone, bookingId);
  if (view.status !== 'booked' && view.status !== 'checked_in') {
    throw new AppError('NOT_BOOKABLE', 409, `A ${view.status.replace('_', ' ')} booking has no deposit to take.`);
  }
  if (view.deposit.dueCents <= 0) throw new AppError('CONFLICT', 409, view.depositCents > 0 ? 'The deposit is paid already.' : 'This booking asks no deposit.');
  return view;
}

/**
 * Sends the client a link (by SMS or e-mail, as the desk chose) that opens the payment provider's hosted page for the
 * deposit due. The link's token is stored hashed; the amount is the server's when the link is opened.
 */
export async function requestDeposit(
  db: Kysely<Database>,
  senders: Senders,
  user: SessionUser,
  bookingId: string,
  channel: 'sms' | 'email',
  baseUrl: string,
  now: Date,
): Promise<DepositDetails> {
  const salon = await findSalon(db, user.salonId);
  const token = randomBytes(24).toString('base64url');
  const planned = await db.transaction().execute(async (trx) => {
    await lockBookingForMoney(trx, bookingId);
    const view = await dueOf(trx, salon, bookingId);
    const client = await findClient(trx, salon.id, view.client.id);
    if (channel === 'sms' && !(client?.phone && !client.smsStoppedAt)) {
      throw new AppError(
        'CONFLICT',
        409,
        client?.smsStoppedAt ? 'This client turned texts off (STOP); send the request by e-mail.' : 'This client has no mobile number.',
      );
    }
    if (channel === 'email' && !client?.email) throw new AppError('CONFLICT', 409, 'This client has no e-mail address.');
    const requestId = await insertDepositRequest(trx, {
      salonId: salon.id,
      bookingId,
      tokenHash: sha256(token),
      channel,
      amountCents: view.deposit.dueCents,
      requestedBy: user.id,
    });
    const ctx = formatFor(salon.timeZone);
    const ahead = sittingAhead(view.sittings, now)!; // every booking has a sitting
    const message = depositRequestMessage({
      salonId: salon.id,
      salonName: salon.name,
      clientId: view.client.id,
      clientName: view.client.name,
      requestId,
      channel,
      serviceName: view.service.name,
      stylistName: view.stylist.name,
      when: formatDateTime(ahead.start, ctx, { year: false }),
      amount: formatMoney(view.deposit.dueCents, salon.currency),
      releasedAt: view.deposit.dueBy ? formatDateTime(view.deposit.dueBy, ctx, { year: false }) : null,
      link: `${baseUrl}/deposit/${token}`,
    });
    await writeAudit(trx, {
      salonId: salon.id,
      actorUserId: user.id,
      entity: 'booking',
      entityId: bookingId,
      action: `deposit requested by ${channel === 'sms' ? 'SMS' : 'e-mail'}: ${formatMoney(view.deposit.dueCents, salon.currency)}`,
    });
    return planClientMessage(trx, message, now);
  });
  for (const m of planned) await sendOnTime(db, senders, m.id, now).catch(() => undefined);
  return detailsIn(db, salon, bookingId);
}

/**
 * The deposit due taken at the desk: in cash or on the salon's card terminal (the card never typed into Dwell), with
 * who took it and when. An open payment page for the booking is closed, so the client cannot pay it twice; a payment
 * that still comes through one is refunded as nobody owes it.
 */
export async function markDepositTaken(
  db: Kysely<Database>,
  payments: Payments,
  user: SessionUser,
  bookingId: string,
  body: z.output<typeof DepositTakenBodySchema>,
): Promise<DepositDetails> {
  const salon = await findSalon(db, user.salonId);
  const open = await db.transaction().execute(async (trx) => {
    await lockBookingForMoney(trx, bookingId);
    const view = await dueOf(trx, salon, bookingId);
    await insertDeskPayment(trx, {
      salonId: salon.id,
      bookingId,
      clientId: view.client.id,
      method: body.method,
      amountCents: view.deposit.dueCents,
      currency: salon.currency,
      recordedBy: user.id,
      note: body.note,
    });
    await writeAudit(trx, {
      salonId: salon.id,
      actorUserId: user.id,
      entity: 'booking',
      entityId: bookingId,
      action: `deposit taken at the desk (${body.method === 'cash' ? 'cash' : 'card terminal'}): ${formatMoney(view.deposit.dueCents, salon.currency)}`,
    });
    return findOpenCheckout(trx, bookingId, 'deposit');
  });
  if (open) await retireCheckout(db, payments, open);
  return detailsIn(db, salon, bookingId);
}
