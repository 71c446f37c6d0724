import { randomBytes } from 'node:crypto';
import type { Kysely } from 'kysely';
import type { z } from 'zod';
import type { Database } from '@server/db/schema';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { OfferViewSchema, OfferWindowSchema } from '@shared/schemas/window.schemas';
import type { Senders } from '../messages';
import { sha256 } from '@server/lib/hash';
import { AppError, forbidden, notFound } from '@server/lib/app-error';
import { findService } from '../services';
import { findSalon } from '../salon';
import { findStaffIdForUser, listStylists } from '../bookings';
import { lockStylists } from '../planning';
import { bookAt } from '../bookings';
import { closeStandby, listStandby } from '../standby';
import { findOffer, insertOffer, lockSlotOffers, setOfferStatus } from './window-offers.repository';
import { assertSkinTestAllows } from '../skin-tests';
import { sendOffer, sendOfferGone, sendOfferTaken } from './offer-messages';
type OfferView = z.infer<typeof OfferViewSchema>;

/** Sends each chosen standby client a link to the window; returns how many were offered. */
export async function offerWindow(db: Kysely<Database>, senders: Senders, user: SessionUser, body: z.infer<typeof OfferWindowSchema>, baseUrl: string) {
  const salon = await findSalon(db, user.salonId);
  if (user.role === 'stylist' && (await findStaffIdForUser(db, user.id)) !== body.stylistId) throw forbidden();
  const [service, stylists, entries] = await Promise.all([findService(db, salon.id, body.serviceId), listStylists(db, salon.id), listStandby(db, salon.id)]);
  const stylist = stylists.find((s) => s.id === body.stylistId);
  if (!service || !stylist) throw notFound('That service or stylist');
  const chosen = entries.filter((e) => body.standbyEntryIds.includes(e.id));
  if (chosen.length !== body.standbyEntryIds.length) {
    throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { standbyEntryIds: 'Pick open standby entries of this salon.' });
  }
  const start = new Date(body.start);
  if (start <= new Date()) throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { start: 'That time has already passed.' });
  // The client takes the time from a link, with no desk in between: the same skin-test and age rule as any online
  // door, checked now so nobody is offered colour they could not take.
  const refused: string[] = [];
  for (const entry of chosen) {
    try {
      await assertSkinTestAllows(
        db,
        salon,
        { clientId: entry.client.id, plan: service.stepPlan, serviceAsks: service.needsSkinTest, starts: [start], atDesk: false },
        new Date(),
      );
    } catch (e) {
      if (!(e instanceof AppError)) throw e;
      refused.push(`${entry.client.name}: ${e.message}`);
    }
  }
  if (refused.length) throw new AppError('SKIN_TEST', 409, `This time cannot be offered to ${refused.join(' ')}`);
  for (const entry of chosen) {
    const token = randomBytes(24).toString('base64url');
    const offerId = await insertOffer(db, {
      salonId: salon.id,
      standbyEntryId: entry.id,
      clientId: entry.client.id,
      serviceId: service.id,
      stylistId: stylist.id,
      startsAt: start,
      tokenHash: sha256(token),
      createdBy: user.id,
    });
    await sendOffer(
      db,
      senders,
      {
        offerId,
        salonId: salon.id,
        to: entry.client,
        salonName: salon.name,
        serviceName: service.name,
        stylistName: stylist.name,
        start,
        timeZone: salon.timeZone,
      },
      `${baseUrl}/offer/${token}`,
    );
  }
  return { offers: chosen.length };
}

export async function viewOffer(db: Kysely<Database>, token: string, now = new Date()): Promise<OfferView> {
  const offer = await findOffer(db, sha256(token));
  if (!offer) throw notFound('That offer');
  const status = offer.status === 'offered' && offer.expiresAt <= now ? 'expired' : offer.status;
  return {
    status,
    salonName: offer.salonName,
    serviceName: offer.serviceName,
    stylistName: offer.stylistName,
    start: offer.startsAt.toISOString(),
    timeZone: offer.timeZone,
    clientName: offer.clientName,
  };
}

/** First to accept wins: the slot's offers are locked, the engine re-checks, the others are told it has gone. */
export async function acceptOffer(db: Kysely<Database>, senders: Senders, token: string, now: Date): Promise<OfferView> {
  const losers = await db.transaction().execute(async (trx) => {
    // Lock order: the stylist first, then the slot's offers; taking a row lock before the stylist lock could
    // deadlock with another accept of the same slot.
    const found = await findOffer(trx, sha256(token));
    if (!found) throw notFound('That offer');
    await lockStylists(trx, [found.stylistId]);
    const slot = await lockSlotOffers(trx, found.stylistId, found.startsAt);
    const offer = (await findOffer(trx, sha256(token)))!;
    if (offer.status !== 'offered' || slot.some((o) => o.status === 'taken')) throw new AppError('CONFLICT', 409, 'Sorry — someone else took this time first.');
    if (offer.expiresAt <= now) throw new AppError('CONFLICT', 409, 'Sorry — this offer has run out.');
    const salon = await findSalon(trx, offer.salonId);
    const service = await findService(trx, salon.id, offer.serviceId);
    if (!service) throw notFound('That service');
    // The slot's offers are settled before booking, so the booking's own withdrawal of clashing offers leaves
    // them alone: the winner is not told "gone", and the others hear it at once below.
    const others = slot.filter((o) => o.id !== offer.id && o.status === 'offered');
    await setOfferStatus(trx, [offer.id], 'taken');
    await setOfferStatus(
      trx,
      others.map((o) => o.id),
      'gone',
    );
    const bookingId = await bookAt(trx, {
      salon,
      clientId: offer.clientId,
      service,
      plan: service.stepPlan,
      stylistId: offer.stylistId,
      start: offer.startsAt,
      actorUserId: null,
      now,
    });
    await setOfferStatus(trx, [offer.id], 'taken', bookingId);
    await closeStandby(trx, salon.id, offer.standbyEntryId);
    return { others, offer, salon, service };
  });
  const { offer, salon, service } = losers;
  const about = {
    salonId: salon.id,
    salonName: salon.name,
    serviceName: service.name,
    stylistName: offer.stylistName,
    start: offer.startsAt,
    timeZone: salon.timeZone,
  };
  await sendOfferTaken(db, senders, { ...about, offerId: offer.id, to: { id: offer.clientId, name: offer.clientName } });
  for (const o of losers.others) await sendOfferGone(db, senders, { ...about, offerId: o.id, to: { id: o.clientId, name: o.clientName } });
  return viewOffer(db, token, now);
}
