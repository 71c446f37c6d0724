import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService } from '../factories/service';
import { messageDesk } from '../factories/messages';
import { sendDueMessages } from '@server/features/messages/send-message.job';
import { FAKE_TWILIO } from '@server/services';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';

let t: TestApp;
let salon: SalonFixture;
let ana: UserFixture;
let m: Awaited<ReturnType<typeof messageDesk>>;
let server: Server;
let serviceId: string;
const db = () => t.testDb.db;
const plan: StepPlan = { sittings: [{ steps: [{ kind: 'hands_on', label: 'Gloss', product: 'toner_direct', minutes: 30 }] }] };

beforeAll(async () => {
  t = await startTestApp();
  salon = await insertSalon(db());
  ana = await insertUser(db(), salon.salonId, 'stylist', { hours: { rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '21:00' } });
  serviceId = await insertPlannedService(db(), salon.salonId, { plan, name: 'Gloss refresh', category: 'treatment', depositCents: 0 });
  m = await messageDesk(t, salon.salonId, ana.staffId!);
  // The fake SMS service posts inbound texts to the app's webhook over HTTP, so the app listens here.
  server = await new Promise((resolve) => {
    const s = t.app.listen(0, '127.0.0.1', () => resolve(s));
  });
  t.sms.setInboundWebhook(`http://127.0.0.1:${(server.address() as AddressInfo).port}/webhooks/sms`, FAKE_TWILIO.authToken);
});
afterAll(async () => {
  await new Promise((resolve) => server.close(resolve));
  await t.close();
});

const live = async (id: string) => (await m.messagesOf(id)).filter((r) => r.status === 'queued').map((r) => `${r.kind} ${r.channel}`);
const card = (id: string, body: object) => m.desk$.write('patch', `/api/clients/${id}`, body);

describe('client preferences', () => {
  it('e-mail only on the client card: queued texts are dropped and new bookings plan no SMS', async () => {
    const c = await m.newClient();
    const first = await m.book(serviceId, plan, '2027-05-04', '10:00', c.clientId!);
    expect(await live(first)).toContain('reminder_24h sms');
    const res = await card(c.clientId!, { name: 'Jo Rivera', email: c.email, phone: '(720) 555-0199', messageChannel: 'email', marketingOptIn: false });
    expect(res.status).toBe(200);
    expect(res.body.phone).toBe('+17205550199'); // stored in E.164 (ITU-T E.164, as libphonenumber-js formats it)
    expect((await live(first)).filter((k) => k.endsWith('sms'))).toEqual([]);
    const second = await m.book(serviceId, plan, '2027-05-05', '10:00', c.clientId!);
    expect((await live(second)).filter((k) => k.endsWith('sms'))).toEqual([]);
    // Back to both: the reminders still ahead get their texts again (not the confirmation: it was sent).
    expect(
      (await card(c.clientId!, { name: 'Jo Rivera', email: c.email, phone: '+1 720 555 0199', messageChannel: 'both', marketingOptIn: false })).status,
    ).toBe(200);
    expect((await live(first)).filter((k) => k.endsWith('sms')).sort()).toEqual(['reminder_24h sms', 'reminder_48h sms']);
    const detail = await m.desk$.get(`/api/clients/${c.clientId}`);
    expect(detail.body).toMatchObject({ phone: '+17205550199', messageChannel: 'both', marketingOptIn: false, smsStoppedAt: null });
  });

  it('the client sets their own channel and marketing opt-in', async () => {
    const c = await m.newClient();
    const client$ = await signedInAgent(t.app, c.email, c.password);
    const id = await m.book(serviceId, plan, '2027-05-06', '10:00', c.clientId!);
    const res = await client$.write('put', '/api/me/preferences', { phone: c.phone, messageChannel: 'sms', marketingOptIn: true });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ messageChannel: 'sms', marketingOptIn: true });
    expect((await live(id)).filter((k) => k.endsWith('email'))).toEqual([]);
    expect((await client$.get('/api/me/preferences')).body.messageChannel).toBe('sms');
    // SMS with no phone is refused, naming the field; nothing changes.
    const bad = await client$.write('put', '/api/me/preferences', { phone: '', messageChannel: 'sms', marketingOptIn: true });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('phone');
    expect((await client$.get('/api/me/preferences')).body.phone).toBe(c.phone);
  });
});

describe('invalid phone and e-mail', () => {
  it('at sign-up: a clear error naming the field, nothing stored', async () => {
    const anon = await anonymousAgent(t.app);
    const before = await db()
      .selectFrom('users')
      .select((eb) => eb.fn.countAll<string>().as('n'))
      .executeTakeFirstOrThrow();
    for (const [phone, email, field] of [
      ['555-12', 'ok@example.test', 'phone'],
      ['+1 720 555 01999', 'ok2@example.test', 'phone'],
      ['+1 720 555 0142', 'not-an-email', 'email'],
    ]) {
      const res = await anon.write('post', '/api/sign-up', { name: 'Pat', email, phone, password: 'long-enough-passphrase' });
      expect(res.status, `${phone} ${email}`).toBe(400);
      expect(Object.keys(res.body.error.fields)).toEqual([field]);
    }
    expect(
      await db()
        .selectFrom('users')
        .select((eb) => eb.fn.countAll<string>().as('n'))
        .executeTakeFirstOrThrow(),
    ).toEqual(before);
    const ok = await anon.write('post', '/api/sign-up', {
      name: 'Pat',
      email: 'pat.e164@example.test',
      phone: '720.555.0142',
      password: 'long-enough-passphrase',
    });
    expect(ok.status).toBe(201);
    expect((await db().selectFrom('clients').select('phone').where('email', '=', 'pat.e164@example.test').executeTakeFirstOrThrow()).phone).toBe(
      '+17205550142',
    );
  });

  it('on the client card: a clear error naming the field, nothing stored', async () => {
    const c = await m.newClient();
    for (const [body, field] of [
      [{ phone: '12345' }, 'phone'],
      [{ email: 'jo@' }, 'email'],
    ] as const) {
      const res = await card(c.clientId!, { name: 'Jo', email: c.email, phone: c.phone, messageChannel: 'both', marketingOptIn: false, ...(body as object) });
      expect(res.status).toBe(400);
      expect(Object.keys(res.body.error.fields)).toEqual([field]);
    }
    expect(await db().selectFrom('clients').select(['phone', 'email']).where('id', '=', c.clientId!).executeTakeFirstOrThrow()).toEqual({
      phone: c.phone,
      email: c.email,
    });
  });
});

describe('inbound STOP and START', () => {
  it('STOP turns SMS off for that number and is confirmed; START turns it back on', async () => {
    const c = await m.newClient();
    const id = await m.book(serviceId, plan, '2027-05-07', '10:00', c.clientId!);
    await sendDueMessages(db(), t.outside, new Date()); // the confirmation goes out
    expect(await t.sms.simulateInbound(c.phone.replace('+1', ''), ' stop ')).toBe(200);
    expect((await live(id)).filter((k) => k.endsWith('sms'))).toEqual([]);
    expect((await live(id)).filter((k) => k.endsWith('email')).length).toBeGreaterThan(0);
    await sendDueMessages(db(), t.outside, new Date());
    expect(m.smsTo(c.phone).at(-1)!.body).toMatch(/no more text messages.*Reply START/);
    expect((await m.desk$.get(`/api/clients/${c.clientId}`)).body.smsStoppedAt).not.toBeNull();
    // A new booking while stopped: no texts planned.
    const later = await m.book(serviceId, plan, '2027-05-08', '10:00', c.clientId!);
    expect((await live(later)).filter((k) => k.endsWith('sms'))).toEqual([]);

    expect(await t.sms.simulateInbound(c.phone, 'START')).toBe(200);
    await sendDueMessages(db(), t.outside, new Date());
    expect(m.smsTo(c.phone).at(-1)!.body).toMatch(/on again/);
    expect((await live(later)).filter((k) => k.endsWith('sms')).sort()).toEqual(['reminder_24h sms', 'reminder_48h sms']);
  });

  it('refuses a webhook call the provider did not sign', async () => {
    const res = await (
      await anonymousAgent(t.app)
    ).agent
      .post('/webhooks/sms')
      .type('form')
      .send({ From: '+17205550100', Body: 'STOP', MessageSid: 'SMforged' });
    expect(res.status).toBe(403);
  });

  it('the desk can send a simulated text through the fake (demo Outbox)', async () => {
    const c = await m.newClient();
    const res = await m.desk$.write('post', '/api/dev/sms/inbound', { from: c.phone, body: 'STOP' });
    expect(res.status).toBe(200);
    expect(res.body.webhookStatus).toBe(200);
    expect((await db().selectFrom('clients').select('sms_stopped_at').where('id', '=', c.clientId!).executeTakeFirstOrThrow()).sms_stopped_at).not.toBeNull();
  });
});
