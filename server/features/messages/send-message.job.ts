import { sql } from 'kysely';
import type { Kysely } from 'kysely';
import type { Database } from '../../db/schema';
import type { Mailer } from '../../mail/mailer';
import type { SmsSender } from '../../sms/sms-sender';

export const SEND_MESSAGE_JOB = 'send-message';
export const SEND_DUE_MESSAGES_JOB = 'send-due-messages';
export const REQUEUE_STUCK_MESSAGES_JOB = 'requeue-stuck-messages';

export interface Senders {
  mailer: Mailer;
  sms: SmsSender;
}

/** Tries before a message is marked failed; waits between them double: 1, 2, 4, 8 minutes. */
export const MAX_ATTEMPTS = 5;
export const backoffMinutes = (attempt: number) => 2 ** (attempt - 1);
/** A claim older than this with no provider reference is taken for a worker that died before sending. */
export const STUCK_AFTER_MINUTES = 5;

type Outcome = 'sent' | 'retry' | 'failed' | 'not-claimed';

/**
 * Sends one message at most once per claim. The claim is a single conditional UPDATE — its own transaction:
 * a second worker blocks on the row lock, re-reads the row, finds it no longer queued and gets nothing, so
 * two workers or two app servers never both send it. The send itself happens outside any transaction (a
 * slow provider must not hold a lock), and its result is written in one update afterwards.
 */
export async function sendMessage(db: Kysely<Database>, senders: Senders, id: string, now: Date): Promise<Outcome> {
  const row = await db
    .updateTable('messages')
    .set((eb) => ({ status: 'sending', claimed_at: now, attempts: eb('attempts', '+', 1) }))
    .where('id', '=', id)
    .where('status', '=', 'queued')
    .where('send_at', '<=', now)
    .returningAll()
    .executeTakeFirst();
  if (!row) return 'not-claimed';
  try {
    const ref = row.channel === 'sms'
      ? (await senders.sms.send(row.to_address, row.body)).sid
      : (await senders.mailer.send({ to: row.to_address, subject: row.subject, text: row.body, attachments: row.attachments }), `smtp:${row.id}`);
    await db.updateTable('messages').set({ status: 'sent', provider_ref: ref, sent_at: new Date(), last_error: null }).where('id', '=', id).execute();
    return 'sent';
  } catch (err) {
    // A request the provider refuses as malformed (400) will not get better by waiting.
    const permanent = (err as { status?: number }).status === 400;
    const failed = permanent || row.attempts >= MAX_ATTEMPTS;
    const retryAt = new Date(now.getTime() + backoffMinutes(row.attempts) * 60_000);
    await db
      .updateTable('messages')
      .set({ status: failed ? 'failed' : 'queued', send_at: failed ? row.send_at : retryAt, last_error: String((err as Error).message ?? err).slice(0, 500) })
      .where('id', '=', id)
      .where('status', '=', 'sending')
      .execute();
    return failed ? 'failed' : 'retry';
  }
}

/** Sends every due message in send_at order (so a provider back after an outage gets them in order). */
export async function sendDueMessages(db: Kysely<Database>, senders: Senders, now: Date, bookingId?: string): Promise<number> {
  let q = db.selectFrom('messages').select('id').where('status', '=', 'queued').where('send_at', '<=', now);
  if (bookingId) q = q.where('booking_id', '=', bookingId);
  const due = await q.orderBy('send_at').orderBy('created_at').limit(100).execute();
  let sent = 0;
  for (const { id } of due) if ((await sendMessage(db, senders, id, now)) === 'sent') sent++;
  return sent;
}

/**
 * Re-queues claims left behind by a worker that died. Trade-off: a crash after the provider accepted the
 * message but before we recorded it re-sends it (at-least-once); never re-queuing would instead lose
 * messages whose worker died before sending (at-most-once). A missed reminder costs a salon a long colour
 * sitting, a duplicate costs one extra text, so Dwell re-queues — but only rows with no provider reference,
 * since a recorded reference proves the provider has it.
 */
export async function requeueStuckMessages(db: Kysely<Database>, now: Date): Promise<number> {
  const rows = await db
    .updateTable('messages')
    .set({ status: 'queued', last_error: 'Worker stopped while sending; queued again' })
    .where('status', '=', 'sending')
    .where('provider_ref', 'is', null)
    .where('claimed_at', '<', sql<Date>`${now}::timestamptz - make_interval(mins => ${STUCK_AFTER_MINUTES})`)
    .returning('id')
    .execute();
  return rows.length;
}
