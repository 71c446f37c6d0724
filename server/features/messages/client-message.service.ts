import type { Kysely } from 'kysely';
import type { Database } from '../../db/schema';
import type { Db } from '../../db/database';
import { insertPlanned, type PlannedMessage } from './plan-messages.service';
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
  const c = await db.selectFrom('clients').select(['email', 'phone', 'message_channel', 'sms_stopped_at']).where('id', '=', m.clientId).executeTakeFirst();
  if (!c) return [];
  const base = { salon_id: m.salonId, client_id: m.clientId, kind: m.kind, send_at: now };
  const rows = [];
  if (c.email && c.message_channel !== 'sms') rows.push({ ...base, channel: 'email' as const, to_address: c.email, subject: m.subject, body: m.email, dedupe_key: `${m.key}:email` });
  if (c.phone && c.message_channel !== 'email' && !c.sms_stopped_at) rows.push({ ...base, channel: 'sms' as const, to_address: c.phone, body: m.sms, dedupe_key: `${m.key}:sms` });
  return insertPlanned(db, rows);
}
