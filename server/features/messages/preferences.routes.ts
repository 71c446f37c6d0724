import { MyPreferencesBodySchema, MyPreferencesSchema, UpdateClientSchema } from '../../../shared/schemas/contact.schemas';
import { myPreferencesPath } from '../../../shared/schemas/contact.schemas';
import type { AppDeps } from '../../app-deps';
import { apiRoute } from '../../lib/api-route';
import { storedPhone } from '../../lib/stored-phone';
import { salonCountry } from '../salon/salon.repository';
import { notFound } from '../../lib/app-error';
import { findClient, findClientIdForUser, updateClientContact } from '../clients/clients.repository';
import { replanClientMessages } from './plan-messages.service';

/** A client reads and sets how the salon reaches them. */
export function registerPreferenceRoutes({ table, db }: AppDeps): void {
  const mine = async (user: { id: string; salonId: string }) => {
    const id = await findClientIdForUser(db, user.id);
    const client = id ? await findClient(db, user.salonId, id) : undefined;
    if (!client) throw notFound('Your client record');
    return client;
  };
  const view = (c: Awaited<ReturnType<typeof mine>>) => ({
    email: c.email, phone: c.phone, messageChannel: c.messageChannel, marketingOptIn: c.marketingOptIn, smsStoppedAt: c.smsStoppedAt?.toISOString() ?? null,
  });
  apiRoute(
    table,
    { method: 'get', path: myPreferencesPath, access: ['client'], summary: 'How the salon reaches me: channel, marketing opt-in, phone', response: MyPreferencesSchema },
    async ({ user }) => view(await mine(user)),
  );
  apiRoute(
    table,
    { method: 'put', path: myPreferencesPath, access: ['client'], summary: 'Set my message channel, marketing opt-in and phone', body: MyPreferencesBodySchema, response: MyPreferencesSchema },
    async ({ user, body }) => {
      const client = await mine(user);
      // The same reachability rule as the desk's card (e-mail stays the sign-in address here).
      UpdateClientSchema.parse({ name: client.name, email: client.email ?? '', phone: body.phone ?? '', messageChannel: body.messageChannel, marketingOptIn: body.marketingOptIn });
      const phone = storedPhone(body.phone, await salonCountry(db, user.salonId));
      await db.transaction().execute(async (trx) => {
        await updateClientContact(trx, user.salonId, client.id, { ...body, phone });
        await replanClientMessages(trx, client.id, new Date());
      });
      return view((await findClient(db, user.salonId, client.id))!);
    },
  );
}
