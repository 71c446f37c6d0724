import { expect } from 'vitest';
import { anonymousAgent, signedInAgent, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from './salon';
import { insertUser, type UserFixture } from './user';
import { insertPlannedService } from './service';

export type Agent = Awaited<ReturnType<typeof signedInAgent>>;

/**
 * A salon taking online bookings of a 30-minute consultation with a $25.00 deposit (ISO 4217 USD: 2500 cents), no
 * quiet hours (a confirmation text goes at once at any hour the suite runs), and one stylist; with helpers that hold
 * a time as a new visitor and let a new client claim it.
 */
export async function onlineBookingSalon(t: TestApp) {
  const db = t.testDb.db;
  const salon: SalonFixture = await insertSalon(db, { chairs: 2, basins: 1 });
  await db.updateTable('salons').set({ quiet_from: '00:00', quiet_to: '00:00' }).where('id', '=', salon.salonId).execute();
  const slug = (await db.selectFrom('salons').select('slug').where('id', '=', salon.salonId).executeTakeFirstOrThrow()).slug;
  const ana: UserFixture = await insertUser(db, salon.salonId, 'stylist');
  const consultation = await insertPlannedService(db, salon.salonId, {
    name: 'Consultation',
    category: 'colour',
    depositCents: 2500,
    plan: { sittings: [{ steps: [{ kind: 'hands_on', label: 'Consultation', product: 'none', minutes: 30 }] }] },
  });
  await db.updateTable('services').set({ online_bookable: true, category: 'consultation' }).where('id', '=', consultation).execute();
  const secrets: Record<string, string> = {};
  let visitors = 0;

  /** A hold from a new visitor; each has an address of their own (behind the loopback proxy), as visitors do. */
  const hold = async (start: string) => {
    const visitor = await anonymousAgent(t.app);
    return visitor.write(
      'post',
      '/api/public/holds',
      { salonSlug: slug, serviceId: consultation, stylistId: ana.staffId, start },
      { 'X-Forwarded-For': `10.1.${Math.floor(visitors / 250)}.${(visitors++ % 250) + 1}` },
    );
  };

  /** A new client (with a mobile) who signs up, claims a hold and (unless told not to) accepts its cautions. */
  const claimedBy = async (start: string, acceptCautions = true) => {
    const held = await hold(start);
    expect(held.status).toBe(201);
    const client = await insertUser(db, salon.salonId, 'client');
    await db.updateTable('clients').set({ phone: '+19705550177' }).where('id', '=', client.clientId!).execute();
    const c = await signedInAgent(t.app, client.email, client.password);
    const claim = await c.write('post', `/api/me/holds/${held.body.holdId}/claim`, { secret: held.body.holdSecret });
    expect(claim.status).toBe(200);
    if (acceptCautions) {
      const accepted = await c.write('post', `/api/me/holds/${held.body.holdId}/cautions`, {
        version: claim.body.cautions.version,
        secret: held.body.holdSecret,
      });
      expect(accepted.status).toBe(204);
    }
    secrets[held.body.holdId] = held.body.holdSecret;
    return { c, client, id: held.body.holdId as string, secret: held.body.holdSecret as string, claim: claim.body };
  };

  return { salon, slug, ana, consultation, secrets, hold, claimedBy };
}

export type OnlineSalon = Awaited<ReturnType<typeof onlineBookingSalon>>;
