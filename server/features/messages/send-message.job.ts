import { sql } from 'kysely';
import type { Kysely } from 'kysely';
import type { Database } from '../../db/schema';
import type { Mailer } from '../../mail/mailer';
import type { SmsSender } from '../../sms/sms-sender';
import { emailHtml } from './html-email';

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
      : (await senders.mailer.send({ to: row.to_address, subject: row.subject, text: row.body, html: emailHtml(row.subject, row.body), attachments: row.attachments }), `smtp:${row.id}`);
    await db.updateTable('messages').set({ status: 'sent', provider_ref: ref, sent_at: new Date(), last_error: null }).where('id', '=', id).execute();
    return 'sent';
  } catch (err) {
    // A request the provider refuses as malformed (400) will not get better by waiting.
    const permanent = (err as { status?: number }).status === 400;
    const failed = permanent || row.attempts >= MAX_ATTEMPTS;
    const retryAt = new Date(now.getTime() + backoffMinutes(row.attempts) * 60_000);
    await db
      .updateTable('messages')
      .set({ status: failed ? 'failed' : 'queued', send_at: failed ? row.send_at : retryAt, due_at: row.due_at ?? row.send_at, last_error: String((err as Error).message ?? err).slice(0, 500) })
      .where('id', '=', id)
      .where('status', '=', 'sending')
      .execute();
    return failed ? 'failed' : 'retry';
  }
}

/** The order messages go out in: when each was first due (retries keep their place). */
const dueOrder = sql<Date>`coalesce(due_at, send_at)`;

/**
 * Per channel, the first-due time of the earliest message waiting out a retry backoff. Messages due after it
 * on that channel wait too: when the provider is back they go out behind it, in their planned order, instead
 * of overtaking it.
 */
async function channelBlockers(db: Kysely<Database>, now: Date): Promise<Map<string, Date>> {
  const rows = await db
    .selectFrom('messages')
    .select(['channel', sql<Date>`min(coalesce(due_at, send_at))`.as('from')])
    .where('status', '=', 'queued')
    .where('attempts', '>', 0)
    .where('send_at', '>', now)
    .groupBy('channel')
    .execute();
  return new Map(rows.map((r) => [r.channel, r.from]));
}

/**
 * Sends every due message in planned order. A message that fails and will be retried stops its channel for
 * the rest of the run (the provider is likely down: no point hammering it, and later ones must not overtake).
 */
export async function sendDueMessages(db: Kysely<Database>, senders: Senders, now: Date, bookingId?: string): Promise<number> {
  let q = db.selectFrom('messages').select(['id', 'channel', dueOrder.as('due')]).where('status', '=', 'queued').where('send_at', '<=', now);
  if (bookingId) q = q.where('booking_id', '=', bookingId);
  const due = await q.orderBy(dueOrder).orderBy('created_at').limit(100).execute();
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
  const row = await db.selectFrom('messages').select(['channel', dueOrder.as('due')]).where('id', '=', id).executeTakeFirst();
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
  const rows = await db
    .updateTable('messages')
    .set({ status: 'queued', last_error: 'Worker stopped while sending; queued again' })
    .where('status', '=', 'sending')
    .where('provider_ref', 'is', null)
    .where('claimed_at', '<', sql<Date>`${now}::timestamptz - make_interval(secs => ${afterSeconds})`)
    .returning('id')
    .execute();
  return rows.length;
}

/**
 * Sends on time rather than on the next minute: every message due within the next two minutes gets its own
 * pg-boss job with startAfter = its send_at (job_at records which instant was queued, so a retry's new time
 * gets a new job). The job only calls sendMessage, whose claim keeps a message from going twice however
 * many jobs or sweeps reach it.
 */
export async function scheduleMessageJobs(db: Kysely<Database>, schedule: (id: string, at: Date) => Promise<void>, now: Date): Promise<number> {
  const rows = await db
    .updateTable('messages')
    .set((eb) => ({ job_at: eb.ref('send_at') }))
    .where('status', '=', 'queued')
    .where('send_at', '<=', sql<Date>`${now}::timestamptz + make_interval(secs => ${SCHEDULE_AHEAD_SECONDS})`)
    .where((eb) => eb.or([eb('job_at', 'is', null), eb('job_at', '!=', eb.ref('send_at'))]))
    .returning(['id', 'send_at'])
    .execute();
  for (const row of rows) await schedule(row.id, row.send_at);
  return rows.length;
}
