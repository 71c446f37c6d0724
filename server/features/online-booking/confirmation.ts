import type { Kysely } from 'kysely';
import type { Database } from '../../db/schema';
import { replanBookingMessages } from '../messages/plan-messages.service';
import { sendDueMessages, type Senders } from '../messages/send-message.job';

/** How long a client's payment answer waits for the confirmation to go out; a slow provider finishes after. */
export const CONFIRMATION_WAIT_MS = 2_000;

/**
 * A paid hold has just become a booking: its confirmation (e-mail with the .ics, and SMS) and reminders go
 * into the send log, and what is due now is sent at once so the client usually has it when the page answers.
 * A slow provider does not hold the page: after CONFIRMATION_WAIT_MS the answer goes and the sending carries
 * on. A channel that fails stays queued and the send job retries it; the claim keeps it from going out twice.
 */
export async function sendConfirmation(db: Kysely<Database>, senders: Senders, bookingId: string, now: Date): Promise<void> {
  await replanBookingMessages(db, bookingId, now);
  // Errors are the send log's business (retried by the job); none may escape into the payment's answer.
  const sending = sendDueMessages(db, senders, now, bookingId).catch(() => undefined);
  let timer: NodeJS.Timeout | undefined;
  await Promise.race([sending, new Promise<void>((resolve) => (timer = setTimeout(resolve, CONFIRMATION_WAIT_MS)))]);
  clearTimeout(timer);
}
