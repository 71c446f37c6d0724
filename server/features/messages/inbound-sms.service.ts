import type { z } from 'zod';
import type { Db } from '../../db/database';
import { START_WORDS, STOP_WORDS, type InboundSmsSchema } from '../../../shared/schemas/inbound-sms.schemas';
import { toE164 } from '../../../shared/format/phone';
import { setSmsStopped } from '../clients/clients.repository';
import { insertPlanned, replanClientMessages } from './plan-messages.service';
import { stopReply } from './templates';

/**
 * STOP turns SMS off for every client with that number (queued texts are dropped) and START turns it back on
 * (reminders still ahead are planned again); either way one confirming text goes out through the send log,
 * keyed on the inbound message's id so a webhook the provider retries confirms once. Other texts are ignored.
 */
export async function handleInboundSms(db: Db, sms: z.infer<typeof InboundSmsSchema>, now: Date): Promise<'stopped' | 'started' | 'ignored'> {
  const word = sms.Body.trim().toUpperCase();
  const stop = STOP_WORDS.includes(word);
  if (!stop && !START_WORDS.includes(word)) return 'ignored';
  const phone = toE164(sms.From) ?? sms.From;
  return db.transaction().execute(async (trx) => {
    const clients = await setSmsStopped(trx, phone, stop, now);
    for (const c of clients) await replanClientMessages(trx, c.id, now);
    if (clients.length > 0) {
      await insertPlanned(trx, [{
        salon_id: clients[0].salonId, client_id: clients[0].id, kind: stop ? 'sms_stopped' : 'sms_started', channel: 'sms',
        to_address: phone, body: stopReply(stop), send_at: now, dedupe_key: `inbound:${sms.MessageSid}`,
      }]);
    }
    return stop ? 'stopped' : 'started';
  });
}
