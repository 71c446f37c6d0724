import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import { firstMessageSends, replanBookingMessages, salonQuietHours, sendDueNow, type Senders } from '../messages';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { ConfirmationSends } from '@shared/schemas/online-booking.schemas';
import { ownBooking } from './my-bookings.service';

/** How long a client's payment answer waits for the confirmation to go out; a slow provider finishes after. */
export const CONFIRMATION_WAIT_MS = 2_000;

/**
 * A hold with no deposit has just become a booking: its confirmation (e-mail with the .ics, and SMS) and reminders
 * go into the send log, and what is due now is sent at once, waiting at most CONFIRMATION_WAIT_MS.
 */
export async function sendConfirmation(db: Kysely<Database>, senders: Senders, bookingId: string, now: Date): Promise<void> {
  await replanBookingMessages(db, bookingId, now);
  await sendDueNow(db, senders, bookingId, now, CONFIRMATION_WAIT_MS);
}

/**
 * How the booking's confirmation stands on each channel, read from the send log, so the page says what really
 * happened: sent, on its way, failed, or (a text) waiting for the salon's quiet hours to end.
 */
export async function confirmationSends(db: Kysely<Database>, user: SessionUser, bookingId: string, now: Date): Promise<ConfirmationSends> {
  const { hold } = await ownBooking(db, user, bookingId);
  const [rows, quiet] = await Promise.all([firstMessageSends(db, bookingId), salonQuietHours(db, hold.salonId)]);
  const latest = new Map<string, (typeof rows)[number]>();
  for (const row of rows) if (!latest.has(row.channel)) latest.set(row.channel, row);
  const sends = [...latest.values()].map((row) => ({
    channel: row.channel,
    status:
      row.status === 'sent'
        ? ('sent' as const)
        : row.status === 'failed'
          ? ('failed' as const)
          : row.status === 'queued' && row.sendAt > now
            ? ('waiting' as const)
            : ('sending' as const),
    sendAt: row.sendAt.toISOString(),
    sentAt: row.sentAt?.toISOString() ?? null,
  }));
  return { timeZone: hold.timeZone, quietHours: quiet.from === quiet.to ? null : quiet, sends: sends.sort((a, b) => a.channel.localeCompare(b.channel)) };
}
