// Phone numbers typed without a country code are read in the salon's country (Set-up → Salon → Country).
// Reference values: libphonenumber's own example mobile number for the United Kingdom (07400 123456,
// from its metadata, `getExampleNumber('GB', examples)`) and the North American 555-01XX block, which
// NANPA keeps for fictional use; E.164 is ITU-T Recommendation E.164 (+, country code, national number).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon } from '../factories/salon';
import { insertUser } from '../factories/user';
import { setupPaths } from '../setup/setup-paths';

let t: TestApp;
let slug: string;
let owner$: Awaited<ReturnType<typeof signedInAgent>>;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  const salon = await insertSalon(db, { timeZone: 'Europe/London' });
  slug = (await db.selectFrom('salons').select('slug').where('id', '=', salon.salonId).executeTakeFirstOrThrow()).slug;
  const owner = await insertUser(db, salon.salonId, 'owner');
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  owner$ = await signedInAgent(t.app, owner.email, owner.password);
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
});
afterAll(() => t.close());

const setCountry = async (country: string) => {
  const settings = (await owner$.get(setupPaths.salon)).body;
  return owner$.write('put', setupPaths.salon, { ...settings, country });
};

describe('the salon country', () => {
  it('is the United States until the owner changes it, and only to a country numbers can be read for', async () => {
    expect((await owner$.get(setupPaths.salon)).body.country).toBe('US');
    const bad = await setCountry('XX');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['country']);
    const ok = await setCountry('GB');
    expect(ok.status).toBe(200);
    expect(ok.body.country).toBe('GB');
  });

  it('reads a number typed as dialled in that country into E.164, and refuses one that is not valid there, naming the field', async () => {
    const made = await desk$.write('post', '/api/clients', { name: 'Imogen Pryce', phone: '07400 123456' });
    expect(made.status).toBe(201);
    expect(made.body.phone).toBe('+447400123456');
    const american = await desk$.write('post', '/api/clients', { name: 'Dale Ortiz', phone: '(970) 555-0142' });
    expect(american.status).toBe(400);
    expect(american.body.error.fields.phone).toMatch(/as dialled in United Kingdom/);
    // With its country code a number from anywhere is kept.
    const withCode = await desk$.write('post', '/api/clients', { name: 'Dale Ortiz', phone: '+1 970 555 0142' });
    expect(withCode.body.phone).toBe('+19705550142');
    const edited = await desk$.write('patch', `/api/clients/${made.body.id}`, {
      name: 'Imogen Pryce',
      email: '',
      phone: '07400 123457',
      messageChannel: 'sms',
      marketingOptIn: false,
    });
    expect(edited.status).toBe(200);
    expect(edited.body.phone).toBe('+447400123457');
  });

  it('at sign-up, a client of that salon types a national number and is stored in E.164; nothing is stored for a bad one', async () => {
    const anon = await anonymousAgent(t.app);
    const bad = await anon.write('post', '/api/sign-up', {
      name: 'Ffion Hale',
      email: 'ffion.bad@example.test',
      phone: '555 0142',
      password: 'long-enough-passphrase',
      salonSlug: slug,
    });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['phone']);
    expect(await t.testDb.db.selectFrom('users').select('id').where('email', '=', 'ffion.bad@example.test').executeTakeFirst()).toBeUndefined();
    const ok = await anon.write('post', '/api/sign-up', {
      name: 'Ffion Hale',
      email: 'ffion@example.test',
      phone: '07400 123458',
      password: 'long-enough-passphrase',
      salonSlug: slug,
    });
    expect(ok.status).toBe(201);
    expect((await t.testDb.db.selectFrom('clients').select('phone').where('email', '=', 'ffion@example.test').executeTakeFirstOrThrow()).phone).toBe(
      '+447400123458',
    );
  });
});
