import type { Kysely } from 'kysely';
import type { Database } from '../../db/schema';
import { replanBookingMessages } from '../messages/plan-messages.service';
import { sendDueMessages, type Senders } from '../messages/send-message.job';

/**
 * A paid hold has just become a booking: its confirmation (e-mail with the .ics, and SMS) and reminders go
 * into the send log, and what is due now is sent at once so the client has it when the page answers. A
 * channel that fails stays queued and the send job retries it; the claim keeps it from going out twice.
 */
export async function sendConfirmation(db: Kysely<Database>, senders: Senders, bookingId: string, now: Date): Promise<void> {
  await replanBookingMessages(db, bookingId, now);
  await sendDueMessages(db, senders, now, bookingId);
}
