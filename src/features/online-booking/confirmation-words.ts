import type { ConfirmationSends } from '@shared/schemas/online-booking.schemas';
import { formatClock, formatDate, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

type Send = ConfirmationSends['sends'][number];
const channelName = { email: 'e-mail', sms: 'text' } as const;

/**
 * What the confirmation page says about the confirmation, from the send log: only what happened or is planned
 * (a text held back by quiet hours says when it will go), never a promise of a message that has not gone.
 */
export function confirmationWords({ sends, timeZone, quietHours }: ConfirmationSends): string[] {
  if (sends.length === 0) return ['No confirmation message is sent for this booking (no address to send it to); it is in My bookings.'];
  const sent = sends.filter((s) => s.status === 'sent');
  const words: string[] = [];
  if (sent.length > 0) words.push(`We sent a confirmation by ${sent.map((s) => channelName[s.channel]).join(' and ')}.`);
  for (const send of sends) {
    if (send.status === 'sending') words.push(`The confirmation ${channelName[send.channel]} is on its way.`);
    if (send.status === 'failed') words.push(`The confirmation ${channelName[send.channel]} could not be sent; your booking is in My bookings.`);
    if (send.status === 'waiting') words.push(waitingWords(send, timeZone, quietHours));
  }
  return words;
}

function waitingWords(send: Send, timeZone: string, quietHours: ConfirmationSends['quietHours']): string {
  const salon = formatFor(timeZone);
  const when = `${formatTime(send.sendAt, salon)} on ${formatDate(send.sendAt, salon, { width: 'short' })} (salon time)`;
  const why =
    send.channel === 'sms' && quietHours
      ? `: the salon sends no texts between ${formatClock(quietHours.from, salon)} and ${formatClock(quietHours.to, salon)}`
      : '';
  return `The confirmation ${channelName[send.channel]} goes at ${when}${why}.`;
}
