import type { Db } from '@server/db/database';
import type { MessageStatus } from '@server/db/schema';
import type { SentMessage } from '@shared/schemas/messages.schemas';
import { listMessages } from './messages.repository';

/** The salon's send log as the Outbox shows it: what Dwell planned, sent, dropped or gave up on. */
export async function sendLog(db: Db, salonId: string, status: MessageStatus | undefined): Promise<{ messages: SentMessage[] }> {
  const rows = await listMessages(db, salonId, status);
  return { messages: rows.map((m) => ({ ...m, sendAt: m.sendAt.toISOString(), sentAt: m.sentAt?.toISOString() ?? null })) };
}
