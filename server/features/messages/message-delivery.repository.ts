import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { MessageAttachment } from '@server/db/schema';

/** A message claimed for sending: what goes out, and what a retry needs. */
export interface ClaimedMessage {
  id: string;
  channel: 'sms' | 'email';
  toAddress: string;
  subject: string;
  body: string;
  attachments: MessageAttachment[];
  /** Tries so far, this one included. */
  attempts: number;
  sendAt: Date;
  dueAt: Date | null;
}

/**
 * Claims a queued, due message: a single conditional UPDATE, its own transaction. A second worker blocks on
 * the row lock, re-reads the row, finds it no longer queued and gets nothing.
 */
export async function claimMessage(db: Db, id: string, now: Date): Promise<ClaimedMessage | undefined> {
  const row = await db
    .updateTable('messages')
    .set((eb) => ({ status: 'sending', claimed_at: now, attempts: eb('attempts', '+', 1) }))
    .where('id', '=', id)
    .where('status', '=', 'queued')
    .where('send_at', '<=', now)
    .returning(['id', 'channel', 'to_address', 'subject', 'body', 'attachments', 'attempts', 'send_at', 'due_at'])
    .executeTakeFirst();
  return (
    row && {
      id: row.id,
      channel: row.channel,
      toAddress: row.to_address,
      subject: row.subject,
      body: row.body,
      attachments: row.attachments,
      attempts: row.attempts,
      sendAt: row.send_at,
      dueAt: row.due_at,
    }
  );
}

export async function markSent(db: Db, id: string, providerRef: string, sentAt: Date): Promise<void> {
  await db.updateTable('messages').set({ status: 'sent', provider_ref: providerRef, sent_at: sentAt, last_error: null }).where('id', '=', id).execute();
}

/** A try that failed: queued again for `sendAt` (keeping when it was first due), or failed for good. */
export async function markTryFailed(db: Db, id: string, outcome: { failed: boolean; sendAt: Date; dueAt: Date; error: string }): Promise<void> {
  await db
    .updateTable('messages')
    .set({ status: outcome.failed ? 'failed' : 'queued', send_at: outcome.sendAt, due_at: outcome.dueAt, last_error: outcome.error })
    .where('id', '=', id)
    .where('status', '=', 'sending')
    .execute();
}

/** The order messages go out in: when each was first due (retries keep their place). */
const dueOrder = sql<Date>`coalesce(due_at, send_at)`;

/** Per channel, the first-due time of the earliest message waiting out a retry backoff. */
export async function channelBlockers(db: Db, now: Date): Promise<Map<string, Date>> {
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

export interface DueMessage {
  id: string;
  channel: 'sms' | 'email';
  /** When it was first due. */
  due: Date;
}

/** Up to 100 queued messages whose time has come (of one booking, when given), in the order they go out. */
export async function dueMessages(db: Db, now: Date, bookingId?: string): Promise<DueMessage[]> {
  let q = db
    .selectFrom('messages')
    .select(['id', 'channel', dueOrder.as('due')])
    .where('status', '=', 'queued')
    .where('send_at', '<=', now);
  if (bookingId) q = q.where('booking_id', '=', bookingId);
  return q.orderBy(dueOrder).orderBy('created_at').limit(100).execute();
}

/** One message's channel and first-due time. */
export async function findDueMessage(db: Db, id: string): Promise<Omit<DueMessage, 'id'> | undefined> {
  return db
    .selectFrom('messages')
    .select(['channel', dueOrder.as('due')])
    .where('id', '=', id)
    .executeTakeFirst();
}

/** Claims older than `afterSeconds` with no provider reference are queued again; answers how many. */
export async function requeueStuck(db: Db, now: Date, afterSeconds: number): Promise<number> {
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
 * Queued messages due within `aheadSeconds` that have no job for their current send_at yet; each is marked as
 * having one (job_at = send_at), so a retry's new time gets a new job.
 */
export async function takeMessagesForJobs(db: Db, now: Date, aheadSeconds: number): Promise<{ id: string; sendAt: Date }[]> {
  return db
    .updateTable('messages')
    .set((eb) => ({ job_at: eb.ref('send_at') }))
    .where('status', '=', 'queued')
    .where('send_at', '<=', sql<Date>`${now}::timestamptz + make_interval(secs => ${aheadSeconds})`)
    .where((eb) => eb.or([eb('job_at', 'is', null), eb('job_at', '!=', eb.ref('send_at'))]))
    .returning(['id', 'send_at as sendAt'])
    .execute();
}
