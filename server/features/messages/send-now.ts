import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import { sendDueMessages, type Senders } from './send-message.job';

/**
 * Sends a booking's messages that are due now, so the client usually has them when the page answers, waiting at
 * most `waitMs`: a slow provider does not hold the answer, the sending carries on after it. A channel that fails
 * stays queued and the send job retries it; the claim keeps it from going out twice.
 */
export async function sendDueNow(db: Kysely<Database>, senders: Senders, bookingId: string, now: Date, waitMs: number): Promise<void> {
  // Errors are the send log's business (retried by the job); none may escape into the caller's answer.
  const sending = sendDueMessages(db, senders, now, bookingId).catch(() => undefined);
  let timer: NodeJS.Timeout | undefined;
  await Promise.race([sending, new Promise<void>((resolve) => (timer = setTimeout(resolve, waitMs)))]);
  clearTimeout(timer);
}
