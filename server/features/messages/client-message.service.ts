import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Db } from '@server/db/database';
import { findClientReach, insertPlanned, type NewMessage, type PlannedMessage } from './messages.repository';
import { sendOnTime, type Senders } from './send-message.job';

/** A one-off message to a client outside a booking's plan (standby and window offers). */
export interface ClientMessage {
  salonId: string;
  clientId: string;
  kind: string;
  /** Unique per message meant: the send log's dedupe key (the channel is appended). */
  key: string;
  subject: string;
  email: string;
  sms: string;
  /** Only these channels: the desk chose how to send it, over the client's usual choice (but never SMS after a STOP). */
  channels?: ('sms' | 'email')[];
}

/**
 * Records the message in the send log on the channels the client wants (their choice, no SMS after a STOP)
 * and sends it now through the same claim as every other message; whatever fails is retried by the sweep.
 */
export async function sendClientMessage(db: Kysely<Database>, senders: Senders, m: ClientMessage, now: Date): Promise<void> {
  const planned = await planClientMessage(db, m, now);
  for (const p of planned) await sendOnTime(db, senders, p.id, now);
}

export async function planClientMessage(db: Db, m: ClientMessage, now: Date): Promise<PlannedMessage[]> {
  const c = await findClientReach(db, m.clientId);
  if (!c) return [];
  const base = { salonId: m.salonId, clientId: m.clientId, kind: m.kind, sendAt: now };
  const rows: NewMessage[] = [];
  const asked = (channel: 'sms' | 'email') => !m.channels || m.channels.includes(channel);
  if (c.email && asked('email') && (m.channels || c.messageChannel !== 'sms'))
    rows.push({ ...base, channel: 'email', toAddress: c.email, subject: m.subject, body: m.email, dedupeKey: `${m.key}:email` });
  if (c.phone && asked('sms') && (m.channels || c.messageChannel !== 'email') && !c.smsStoppedAt)
    rows.push({ ...base, channel: 'sms', toAddress: c.phone, body: m.sms, dedupeKey: `${m.key}:sms` });
  return insertPlanned(db, rows);
}
