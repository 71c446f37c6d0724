import { DateTime } from 'luxon';
import type { Mailer } from '../../mail/mailer';
import type { SmsSender } from '../../sms/sms-sender';
import type { HoldRow } from './holds.repository';
import { bookingIcs } from './booking-ics';

/** What to bring or do, by kind of appointment (common practice for colour work). */
function preparation(category: string): string {
  if (category === 'skin_test') return 'Come with clean, dry skin behind the ear or on the inner arm. Keep the patch dry for 48 hours and tell us at once about any itching, redness or swelling.';
  if (category === 'consultation') return 'Bring photos of the colour you want, and tell us about every colour, box dye, henna or straightening your hair has had. Come with dry hair, styled as you usually wear it.';
  return 'Come with dry hair. For long colour sittings, eat beforehand and bring something to read.';
}

/** Confirmation by e-mail (with the .ics file) and SMS; a channel that fails is logged, not fatal. */
export async function sendConfirmation(deps: { mailer: Mailer; sms: SmsSender }, hold: HoldRow, to: { name: string; email: string | null; phone: string | null }): Promise<void> {
  const when = DateTime.fromJSDate(hold.start, { zone: hold.timeZone }).toFormat("cccc d LLLL yyyy 'at' h:mm a ZZZZ");
  const summary = `${hold.serviceName} with ${hold.stylistName}, ${when}, at ${hold.salonName}, ${hold.address}.`;
  const text = `Hello ${to.name},\n\nYou're booked: ${summary}\n\n${preparation(hold.category)}\n\nTo move or cancel, open My bookings in Dwell.\n`;
  const ics = bookingIcs({ uid: `${hold.id}@dwell`, title: `${hold.serviceName} at ${hold.salonName}`, description: summary, location: hold.address, start: hold.start, end: hold.end });
  const sends: Promise<unknown>[] = [];
  if (to.email) sends.push(deps.mailer.send({ to: to.email, subject: `Booked: ${hold.serviceName}, ${when}`, text, attachments: [{ filename: 'booking.ics', content: ics, contentType: 'text/calendar; charset=utf-8; method=PUBLISH' }] }));
  if (to.phone) sends.push(deps.sms.send(to.phone, `${hold.salonName}: booked — ${summary} Reply to the salon to change it.`));
  for (const r of await Promise.allSettled(sends)) if (r.status === 'rejected') console.error('confirmation not sent:', r.reason);
}
