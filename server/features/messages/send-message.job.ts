import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Mailer } from '@server/mail/mailer';
import type { SmsSender } from '@server/sms/sms-sender';
import { logger } from '@server/lib/logger';
import { emailHtml } from './html-email';
import {
  channelBlockers,
  claimMessage,
  dueMessages,
  findDueMessage,
  markSent,
  markTryFailed,
  requeueStuck,
  takeMessagesForJobs,
} from './message-delivery.repository';

export const SEND_MESSAGE_JOB = 'send-message';
export const SEND_DUE_MESSAGES_JOB = 'send-due-messages';
export const REQUEUE_STUCK_MESSAGES_JOB = 'requeue-stuck-messages';
export const SCHEDULE_MESSAGE_JOBS_JOB = 'schedule-message-jobs';
/** How far ahead the per-minute pass queues a job per message at its exact instant. */
export const SCHEDULE_AHEAD_SECONDS = 120;

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
  const m = await claimMessage(db, id, now);
  if (!m) return 'not-claimed';
  try {
    const ref =
      m.channel === 'sms'
        ? (await senders.sms.send(m.toAddress, m.body)).sid
        : (await senders.mailer.send({ to: m.toAddress, subject: m.subject, text: m.body, html: emailHtml(m.subject, m.body), attachments: m.attachments }),
          `smtp:${m.id}`);
    await markSent(db, id, ref, new Date());
    // Never the address or the text: the message id finds both in the send log.
    logger.info({ messageId: id, channel: m.channel, attempt: m.attempts, providerRef: ref }, 'message sent');
    return 'sent';
  } catch (err) {
    // A request the provider refuses as malformed (400) will not get better by waiting.
    const permanent = (err as { status?: number }).status === 400;
    const failed = permanent || m.attempts >= MAX_ATTEMPTS;
    const retryAt = new Date(now.getTime() + backoffMinutes(m.attempts) * 60_000);
    logger.warn(
      {
        messageId: id,
        channel: m.channel,
        attempt: m.attempts,
        failed,
        retryAt: failed ? null : retryAt,
        reason: String((err as Error).message ?? err).slice(0, 200),
      },
      failed ? 'message failed' : 'message not sent; will retry',
    );
    await markTryFailed(db, id, {
      failed,
      sendAt: failed ? m.sendAt : retryAt,
      dueAt: m.dueAt ?? m.sendAt,
      error: String((err as Error).message ?? err).slice(0, 500),
    });
    return failed ? 'failed' : 'retry';
  }
}

/**
 * Sends every due message in planned order. A message that fails and will be retried stops its channel for
 * the rest of the run (the provider is likely down: no point hammering it, and later ones must not overtake).
 * Per channel, messages first due after one still waiting out a retry backoff wait too: when the provider is
 * back they go out behind it, in their planned order, instead of overtaking it.
 */
export async function sendDueMessages(db: Kysely<Database>, senders: Senders, now: Date, bookingId?: string): Promise<number> {
  const due = await dueMessages(db, now, bookingId);
  const blocked = await channelBlockers(db, now);
  let sent = 0;
  for (const { id, channel, due: at } of due) {
    const from = blocked.get(channel);
    if (from && at > from) continue;
    const outcome = await sendMessage(db, senders, id, now);
    if (outcome === 'sent') sent++;
    if (outcome === 'retry') blocked.set(channel, new Date(0));
  }
  return sent;
}

/**
 * What a message's own job (queued for its exact instant) runs: send it unless an earlier message on its
 * channel is still waiting to be retried, then let anything that queued up behind it follow in order.
 */
export async function sendOnTime(db: Kysely<Database>, senders: Senders, id: string, now: Date): Promise<Outcome> {
  const row = await findDueMessage(db, id);
  if (!row) return 'not-claimed';
  const from = (await channelBlockers(db, now)).get(row.channel);
  if (from && row.due > from) return 'not-claimed';
  const outcome = await sendMessage(db, senders, id, now);
  if (outcome === 'sent') await sendDueMessages(db, senders, now);
  return outcome;
}

/**
 * Re-queues claims left behind by a worker that died. Trade-off: a crash after the provider accepted the
 * message but before we recorded it re-sends it (at-least-once); never re-queuing would instead lose
 * messages whose worker died before sending (at-most-once). A missed reminder costs a salon a long colour
 * sitting, a duplicate costs one extra text, so Dwell re-queues — but only rows with no provider reference,
 * since a recorded reference proves the provider has it.
 */
export async function requeueStuckMessages(db: Kysely<Database>, now: Date, afterSeconds = STUCK_AFTER_MINUTES * 60): Promise<number> {
  return requeueStuck(db, now, afterSeconds);
}

/**
 * Sends on time rather than on the next minute: every message due within the next two minutes gets its own
 * pg-boss job with startAfter = its send_at (job_at records which instant was queued, so a retry's new time
 * gets a new job). The job only calls sendMessage, whose claim keeps a message from going twice however
 * many jobs or sweeps reach it.
 */
export async function scheduleMessageJobs(db: Kysely<Database>, schedule: (id: string, at: Date) => Promise<void>, now: Date): Promise<number> {
  const messages = await takeMessagesForJobs(db, now, SCHEDULE_AHEAD_SECONDS);
  for (const m of messages) await schedule(m.id, m.sendAt);
  return messages.length;
}
