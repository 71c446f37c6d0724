import type { z } from 'zod';
import type { Db } from '@server/db/database';
import { UpdateClientSchema, type MyPreferences, type MyPreferencesBodySchema } from '@shared/schemas/contact.schemas';
import { notFound } from '@server/lib/app-error';
import { storedPhone } from '@server/lib/stored-phone';
import { findClient, findClientIdForUser, updateClientContact } from '../clients';
import { salonCountry } from '../salon';
import { replanClientMessages } from './plan-messages.service';

type Me = { id: string; salonId: string };

async function myClient(db: Db, user: Me) {
  const id = await findClientIdForUser(db, user.id);
  const client = id ? await findClient(db, user.salonId, id) : undefined;
  if (!client) throw notFound('Your client record');
  return client;
}

const view = (c: Awaited<ReturnType<typeof myClient>>): MyPreferences => ({
  email: c.email,
  phone: c.phone,
  messageChannel: c.messageChannel,
  marketingOptIn: c.marketingOptIn,
  smsStoppedAt: c.smsStoppedAt?.toISOString() ?? null,
});

/** How the salon reaches the signed-in client. */
export async function myPreferences(db: Db, user: Me): Promise<MyPreferences> {
  return view(await myClient(db, user));
}

/** The client sets their channel, marketing opt-in and phone; their queued messages follow at once. */
export async function saveMyPreferences(db: Db, user: Me, body: z.output<typeof MyPreferencesBodySchema>, now: Date): Promise<MyPreferences> {
  const client = await myClient(db, user);
  // The same reachability rule as the desk's card (e-mail stays the sign-in address here).
  UpdateClientSchema.parse({
    name: client.name,
    email: client.email ?? '',
    phone: body.phone ?? '',
    messageChannel: body.messageChannel,
    marketingOptIn: body.marketingOptIn,
  });
  const phone = storedPhone(body.phone, await salonCountry(db, user.salonId));
  await db.transaction().execute(async (trx) => {
    await updateClientContact(trx, user.salonId, client.id, { ...body, phone });
    await replanClientMessages(trx, client.id, now);
  });
  return view((await findClient(db, user.salonId, client.id))!);
}
