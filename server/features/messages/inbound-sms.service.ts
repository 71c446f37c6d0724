import type { z } from 'zod';
import type { Db } from '@server/db/database';
import type { SmsFake } from '@server/fakes/sms-fake';
import { START_WORDS, STOP_WORDS, type InboundSmsSchema, type SimulateInboundSmsSchema } from '@shared/schemas/inbound-sms.schemas';
import { toE164 } from '@shared/format/phone';
import { notFound } from '@server/lib/app-error';
import { storedPhone } from '@server/lib/stored-phone';
import { setSmsStopped } from '../clients';
import { salonCountry } from '../salon';
import { insertPlanned } from './messages.repository';
import { replanClientMessages } from './plan-messages.service';
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
    const [first] = clients;
    if (first) {
      await insertPlanned(trx, [
        {
          salonId: first.salonId,
          clientId: first.id,
          kind: stop ? 'sms_stopped' : 'sms_started',
          channel: 'sms',
          toAddress: phone,
          body: stopReply(stop),
          sendAt: now,
          dedupeKey: `inbound:${sms.MessageSid}`,
        },
      ]);
    }
    return stop ? 'stopped' : 'started';
  });
}

/** Demo/dev: the SMS fake delivers a text from a phone (read in the salon's country) to the webhook; answers the webhook's status. */
export async function simulateInboundSms(
  db: Db,
  smsFake: SmsFake | null,
  salonId: string,
  sms: z.output<typeof SimulateInboundSmsSchema>,
): Promise<{ webhookStatus: number }> {
  if (!smsFake) throw notFound('The demo SMS service');
  const from = storedPhone(sms.from, await salonCountry(db, salonId), 'from');
  return { webhookStatus: await smsFake.simulateInbound(from, sms.body) };
}
