import { createEvent } from 'ics';

export interface IcsInput {
  uid: string;
  title: string;
  description: string;
  location: string;
  start: Date;
  end: Date;
}

/**
 * One appointment as an RFC 5545 calendar file, in UTC (DTSTART/DTEND with Z) so every calendar agrees.
 * No ORGANIZER: RFC 5545 §3.8.4.3 needs a cal-address (mailto:) for it, and the salon has no mailbox here.
 */
export function bookingIcs(input: IcsInput): string {
  const utc = (d: Date) =>
    [d.getUTCFullYear(), d.getUTCMonth() + 1, d.getUTCDate(), d.getUTCHours(), d.getUTCMinutes()] as [number, number, number, number, number];
  const { error, value } = createEvent({
    uid: input.uid,
    title: input.title,
    description: input.description,
    location: input.location,
    start: utc(input.start),
    startInputType: 'utc',
    startOutputType: 'utc',
    end: utc(input.end),
    endInputType: 'utc',
    endOutputType: 'utc',
    productId: '-//Dwell//Salon bookings//EN',
    status: 'CONFIRMED',
  });
  if (error || !value) throw error ?? new Error('calendar file could not be made');
  return value;
}
