import { skinTestWords } from '@shared/rules/skin-test-words';
import type { MessageAttachment } from '@server/db/schema';
import { bookingIcs } from '../online-booking';
import { formatDateTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

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
  /** Hours a skin test must have been read before colour (the salon's setting). */
  skinTestLeadHours: number;
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
  if (category === 'skin_test')
    return 'Come with clean, dry skin behind the ear or on the inner arm. Keep the patch dry for 48 hours and tell us at once about any itching, redness or swelling.';
  if (category === 'consultation')
    return 'Bring photos of the colour you want, and tell us about every colour, box dye, henna or straightening your hair has had. Come with dry hair, styled as you usually wear it.';
  return 'Come with dry hair. For long colour sittings, eat beforehand and bring something to read.';
}

export const firstName = (name: string) => name.trim().split(/\s+/)[0] || 'there';
/** "Tuesday 8 June 2027 at 3:00 PM MDT": a sitting in every client message. */
export const when = (d: Date, zone: string) => formatDateTime(d, formatFor(zone), { zoneName: true });

function sittingLines(c: BookingContext): string {
  const many = c.sittings.length > 1;
  return c.sittings.map((s) => `${many ? `Sitting ${s.seq} of ${c.sittings.length}: ` : ''}${when(s.start, c.timeZone)}`).join('\n');
}

/** One calendar file per sitting; a single sitting keeps the plain name calendars expect. */
function calendarFiles(c: BookingContext): MessageAttachment[] {
  return c.sittings.map((s) => ({
    filename: c.sittings.length === 1 ? 'booking.ics' : `sitting-${s.seq}.ics`,
    content: bookingIcs({
      uid: `${c.bookingId}-${s.seq}@dwell`,
      title: `${c.serviceName} at ${c.salonName}`,
      description: `${c.serviceName} with ${c.stylistName}`,
      location: c.address,
      start: s.start,
      end: s.end,
    }),
    contentType: 'text/calendar; charset=utf-8; method=PUBLISH',
  }));
}

/** Confirmation, change or cancellation of a whole booking. */
/**
 * The notice of a booking made, moved or cancelled. A booking that waits on an unread skin test is not called
 * confirmed: the colour goes ahead only once the test reads negative.
 */
export function bookingMessage(kind: BookingMessageKind, c: BookingContext, waitingOnTest = false): MessageText {
  const hello = `Hello ${firstName(c.clientName)},`;
  const first = when(c.sittings[0]!.start, c.timeZone); // a booking has at least one sitting
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
  if (waitingOnTest) {
    const note =
      'This time is kept for you while your skin test is read. The colour goes ahead only if the test shows no reaction; we will tell you if it cannot.';
    return {
      sms: `${c.salonName}: ${c.serviceName} with ${c.stylistName}, ${first} is kept for you, waiting on your skin test result. ${HOW_TO_CHANGE}`,
      subject: `Kept for you, waiting on your skin test: ${c.serviceName}, ${first}`,
      email: `${hello}\n\n${summary}.\n${sittingLines(c)}\n\n${note}\n\n${preparation(c.category)}\n\n${HOW_TO_CHANGE}\n`,
      attachments: calendarFiles(c),
    };
  }
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

/** Professional-practice caution that closes every message about chemicals on skin or scalp. */
export const CHEMICAL_CAUTION =
  'This is general salon guidance, not medical advice: your stylist follows licensed practice and local regulations, and a doctor or pharmacist is the one to ask about any reaction.';

/**
 * Skin test booked: what it is, the lead time before colour, and what to do about a reaction. The 48 h
 * reading is common practice and the colour manufacturers' instruction for oxidative dyes (EU Regulation
 * 1223/2009 requires the allergy warning on such products); the salon's own lead time is used here.
 */
export function skinTestBookedMessage(c: BookingContext): MessageText {
  const at = when(c.sittings[0]!.start, c.timeZone); // a booking has at least one sitting
  const lead = c.skinTestLeadHours;
  const what = `A skin test (allergy alert test) puts a small dab of the colour we will use behind your ear or on your inner arm. ${skinTestWords(lead)} So book the colour no sooner than ${lead} hours after this test.`;
  const reaction =
    'If you feel itching, burning, redness or swelling at the patch (or anywhere) before your colour, wash the patch with water, do not have the colour done, and call the salon. If it is severe (swelling of the face, difficulty breathing) get medical help at once.';
  return {
    sms: `${c.salonName}: skin test booked, ${at}. It must be read at least ${lead} h before your colour. Any itching, redness or swelling: wash it off and call us; severe reactions: get medical help. ${HOW_TO_CHANGE}`,
    subject: `Skin test booked: ${at}`,
    email: `Hello ${firstName(c.clientName)},\n\nYour skin test at ${c.salonName}, ${c.address} is booked: ${at}.\n\n${what}\n\n${preparation('skin_test')}\n\n${reaction}\n\n${CHEMICAL_CAUTION}\n\n${HOW_TO_CHANGE}\n`,
    attachments: calendarFiles(c),
  };
}

/** The evening before a later sitting of a multi-sitting booking (e.g. "day 2 of 2" of a correction). */
export function dayBeforeSittingMessage(c: BookingContext, seq: number): MessageText {
  const sitting = c.sittings.find((s) => s.seq === seq)!;
  const at = when(sitting.start, c.timeZone);
  const part = `day ${seq} of ${c.sittings.length}`;
  return {
    sms: `${c.salonName}: tomorrow is ${part} of your ${c.serviceName}, ${at}. ${preparation(c.category)} ${HOW_TO_CHANGE}`,
    subject: `Tomorrow, ${part}: ${c.serviceName}`,
    email: `Hello ${firstName(c.clientName)},\n\nTomorrow is ${part} of your ${c.serviceName} with ${c.stylistName} at ${c.salonName}, ${c.address}: ${at}.\n\nIf anything has changed since the last sitting (itching, a sore scalp, hair breaking) tell us before you come.\n\n${preparation(c.category)}\n\n${HOW_TO_CHANGE}\n`,
    attachments: [],
  };
}

/** Aftercare the day after a colour sitting, by kind of colour work (see aftercare-notes.ts). */
export function aftercareMessage(c: BookingContext, notes: string): MessageText {
  return {
    sms: `${c.salonName}: caring for your ${c.serviceName}: ${notes.split('\n')[0]} Full notes are in your e-mail. Any scalp soreness or itching: call us.`,
    subject: `Aftercare for your ${c.serviceName}`,
    email: `Hello ${firstName(c.clientName)},\n\nThank you for your ${c.serviceName} with ${c.stylistName}. To keep it at its best:\n\n${notes}\n\nIf your scalp is sore, itchy or blistered, rinse with cool water and call the salon. ${CHEMICAL_CAUTION}\n`,
    attachments: [],
  };
}

/** A marketing follow-up from an owner's rule (only for clients who opted in); the rule's text is the owner's. */
export function followUpMessage(c: BookingContext, rule: { title: string; text: string }): MessageText {
  return {
    sms: `${c.salonName}: ${rule.text} Reply STOP to stop texts.`,
    subject: `${rule.title} — ${c.salonName}`,
    email: `Hello ${firstName(c.clientName)},\n\n${rule.text}\n\nBook online in Dwell or call the salon.\n\nYou get these suggestions because you said yes to them; turn them off any time under Messages on your Dwell page.\n`,
    attachments: [],
  };
}

/** The answer to an inbound STOP or START (carriers expect a confirmation either way). */
export function stopReply(stopped: boolean): string {
  return stopped
    ? 'Dwell: you will get no more text messages from your salon. E-mail reminders continue if you have them. Reply START to turn texts back on.'
    : 'Dwell: text messages from your salon are on again. Reply STOP to stop them.';
}
