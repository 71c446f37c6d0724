import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Db } from '@server/db/database';
import type { Senders } from '../messages';
import { planClientMessage, sendClientMessage, type ClientMessage } from '../messages';
import { formatDateTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

export interface OfferMessage {
  offerId: string;
  salonId: string;
  to: { id: string; name: string };
  salonName: string;
  serviceName: string;
  stylistName: string;
  start: Date;
  timeZone: string;
}

const when = (m: OfferMessage) => formatDateTime(m.start, formatFor(m.timeZone), { year: false, zoneName: true });

/** Offer, taken and gone all go through the send log, keyed on the offer, so each is sent once. */
function offerMessage(m: OfferMessage, kind: string, subject: string, text: string): ClientMessage {
  return { salonId: m.salonId, clientId: m.to.id, kind, key: `offer:${m.offerId}:${kind}`, subject, email: `Hello ${m.to.name},\n\n${text}\n`, sms: text };
}

function send(db: Kysely<Database>, senders: Senders, m: OfferMessage, kind: string, subject: string, text: string) {
  return sendClientMessage(db, senders, offerMessage(m, kind, subject, text), new Date());
}

function goneMessage(m: OfferMessage): ClientMessage {
  const text = `${m.salonName}: the ${m.serviceName} time on ${when(m)} has been taken. You stay on our standby list.`;
  return offerMessage(m, 'window_offer_gone', `That time has gone: ${m.serviceName}`, text);
}

export function sendOffer(db: Kysely<Database>, senders: Senders, m: OfferMessage, link: string) {
  const text = `${m.salonName}: a time opened up — ${m.serviceName} with ${m.stylistName}, ${when(m)}. First to take it gets it: ${link}`;
  return send(db, senders, m, 'window_offer', `A time opened up: ${m.serviceName}, ${when(m)}`, text);
}

export function sendOfferTaken(db: Kysely<Database>, senders: Senders, m: OfferMessage) {
  const text = `${m.salonName}: the ${m.serviceName} time on ${when(m)} is yours. Your booking confirmation follows.`;
  return send(db, senders, m, 'window_offer_taken', `It's yours: ${m.serviceName}, ${when(m)}`, text);
}

export function sendOfferGone(db: Kysely<Database>, senders: Senders, m: OfferMessage) {
  return sendClientMessage(db, senders, goneMessage(m), new Date());
}

/** The same "gone" message, planned inside the caller's transaction; the send sweep delivers it within a minute. */
export function planOfferGone(db: Db, m: OfferMessage, now: Date) {
  return planClientMessage(db, goneMessage(m), now);
}
