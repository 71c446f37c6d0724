import { DateTime } from 'luxon';
import type { Mailer } from '../../mail/mailer';
import type { SmsSender } from '../../sms/sms-sender';

export interface OfferMessage {
  to: { name: string; phone: string | null; email: string | null };
  salonName: string;
  serviceName: string;
  stylistName: string;
  start: Date;
  timeZone: string;
}

const when = (m: OfferMessage) => DateTime.fromJSDate(m.start, { zone: m.timeZone }).toFormat("cccc d LLLL 'at' h:mm a ZZZZ");

/** Sends on every channel the client has; a channel that fails does not stop the others. */
async function sendBoth(deps: { mailer: Mailer; sms: SmsSender }, m: OfferMessage, subject: string, text: string) {
  const jobs: Promise<unknown>[] = [];
  if (m.to.phone) jobs.push(deps.sms.send(m.to.phone, text));
  if (m.to.email) jobs.push(deps.mailer.send({ to: m.to.email, subject, text }));
  const results = await Promise.allSettled(jobs);
  for (const r of results) if (r.status === 'rejected') console.error('offer message not sent:', r.reason);
}

export function sendOffer(deps: { mailer: Mailer; sms: SmsSender }, m: OfferMessage, link: string) {
  const text = `${m.salonName}: a time opened up — ${m.serviceName} with ${m.stylistName}, ${when(m)}. First to take it gets it: ${link}`;
  return sendBoth(deps, m, `A time opened up: ${m.serviceName}, ${when(m)}`, `Hello ${m.to.name},\n\n${text}\n`);
}

export function sendOfferTaken(deps: { mailer: Mailer; sms: SmsSender }, m: OfferMessage) {
  const text = `${m.salonName}: the ${m.serviceName} time on ${when(m)} has been taken. You stay on our standby list.`;
  return sendBoth(deps, m, `That time has gone: ${m.serviceName}`, `Hello ${m.to.name},\n\n${text}\n`);
}
