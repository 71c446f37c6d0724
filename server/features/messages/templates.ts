import { DateTime } from 'luxon';
import type { MessageAttachment } from '../../db/schema';
import { bookingIcs } from '../online-booking/booking-ics';

/** What every booking message may mention, loaded once per re-plan. */
export interface BookingContext {
  bookingId: string;
  salonName: string;
  address: string;
  timeZone: string;
  clientName: string;
  serviceName: string;
  category: string;
  stylistName: string;
  sittings: { seq: number; start: Date; end: Date }[];
}

export type BookingMessageKind = 'confirmation' | 'change' | 'cancellation';

export interface MessageText {
  sms: string;
  subject: string;
  email: string;
  attachments: MessageAttachment[];
}

const HOW_TO_CHANGE = 'To move or cancel, open My bookings in Dwell or call the salon.';

/** What to bring or do, by kind of appointment (common practice for colour work). */
export function preparation(category: string): string {
  if (category === 'skin_test') return 'Come with clean, dry skin behind the ear or on the inner arm. Keep the patch dry for 48 hours and tell us at once about any itching, redness or swelling.';
  if (category === 'consultation') return 'Bring photos of the colour you want, and tell us about every colour, box dye, henna or straightening your hair has had. Come with dry hair, styled as you usually wear it.';
  return 'Come with dry hair. For long colour sittings, eat beforehand and bring something to read.';
}

const firstName = (name: string) => name.trim().split(/\s+/)[0] || 'there';
const when = (d: Date, zone: string) => DateTime.fromJSDate(d, { zone }).toFormat("cccc d LLLL yyyy 'at' h:mm a ZZZZ");

function sittingLines(c: BookingContext): string {
  const many = c.sittings.length > 1;
  return c.sittings.map((s) => `${many ? `Sitting ${s.seq} of ${c.sittings.length}: ` : ''}${when(s.start, c.timeZone)}`).join('\n');
}

/** One calendar file per sitting; a single sitting keeps the plain name calendars expect. */
function calendarFiles(c: BookingContext): MessageAttachment[] {
  return c.sittings.map((s) => ({
    filename: c.sittings.length === 1 ? 'booking.ics' : `sitting-${s.seq}.ics`,
    content: bookingIcs({ uid: `${c.bookingId}-${s.seq}@dwell`, title: `${c.serviceName} at ${c.salonName}`, description: `${c.serviceName} with ${c.stylistName}`, location: c.address, start: s.start, end: s.end }),
    contentType: 'text/calendar; charset=utf-8; method=PUBLISH',
  }));
}

/** Confirmation, change or cancellation of a whole booking. */
export function bookingMessage(kind: BookingMessageKind, c: BookingContext): MessageText {
  const hello = `Hello ${firstName(c.clientName)},`;
  const first = when(c.sittings[0].start, c.timeZone);
  if (kind === 'cancellation') {
    return {
      sms: `${c.salonName}: your ${c.serviceName} on ${first} is cancelled.`,
      subject: `Cancelled: ${c.serviceName}, ${first}`,
      email: `${hello}\n\nYour ${c.serviceName} with ${c.stylistName} at ${c.salonName} is cancelled:\n${sittingLines(c)}\n\nTo book again, open Dwell or call the salon.\n`,
      attachments: [],
    };
  }
  const verb = kind === 'change' ? 'Moved' : 'Booked';
  const summary = `${c.serviceName} with ${c.stylistName} at ${c.salonName}, ${c.address}`;
  return {
    sms: `${c.salonName}: ${kind === 'change' ? 'moved' : 'booked'} — ${c.serviceName} with ${c.stylistName}, ${first}${c.sittings.length > 1 ? ` (sitting 1 of ${c.sittings.length})` : ''}. ${HOW_TO_CHANGE}`,
    subject: `${verb}: ${c.serviceName}, ${first}`,
    email: `${hello}\n\n${kind === 'change' ? 'Your booking has moved' : "You're booked"}: ${summary}.\n${sittingLines(c)}\n\n${preparation(c.category)}\n\n${HOW_TO_CHANGE}\n`,
    attachments: calendarFiles(c),
  };
}

/** The reminder `hours` before one sitting, with that service's preparation notes. */
export function reminderMessage(c: BookingContext, seq: number, hours: number): MessageText {
  const sitting = c.sittings.find((s) => s.seq === seq)!;
  const at = when(sitting.start, c.timeZone);
  const part = c.sittings.length > 1 ? ` (sitting ${seq} of ${c.sittings.length})` : '';
  const soon = hours <= 24 ? 'tomorrow' : `in ${Math.round(hours / 24)} days`;
  return {
    sms: `${c.salonName}: reminder, ${c.serviceName}${part} ${soon}, ${at}. ${preparation(c.category)} ${HOW_TO_CHANGE}`,
    subject: `Reminder: ${c.serviceName}${part}, ${at}`,
    email: `Hello ${firstName(c.clientName)},\n\nA reminder of your ${c.serviceName}${part} with ${c.stylistName} at ${c.salonName}, ${c.address}: ${at}.\n\n${preparation(c.category)}\n\n${HOW_TO_CHANGE}\n`,
    attachments: [],
  };
}
