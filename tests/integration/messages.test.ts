import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DateTime } from 'luxon';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService } from '../factories/service';
import { localIso } from '../setup/dates';
import { outOfQuietHours } from '@server/features/messages/quiet-hours';
import { requeueStuckMessages, sendDueMessages, sendMessage } from '@server/features/messages/send-message.job';

let t: TestApp;
let salon: SalonFixture;
let ana: UserFixture;
let serviceId: string;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
let phones = 0;
const Z = 'America/Denver';
const plan = { sittings: [{ steps: [{ kind: 'hands_on' as const, label: 'Gloss', product: 'toner_direct' as const, minutes: 30 }] }] };
const db = () => t.testDb.db;
const iso = (d: Date) => d.toISOString();

beforeAll(async () => {
  t = await startTestApp();
  salon = await insertSalon(db());
  // Open Mondays too, so a sitting can fall the day after each daylight-saving change (both on Sundays).
  await db().insertInto('salon_hours').values({ salon_id: salon.salonId, rrule: 'FREQ=WEEKLY;BYDAY=MO', start_time: '09:00', end_time: '21:00' }).execute();
  ana = await insertUser(db(), salon.salonId, 'stylist', { hours: { rrule: 'FREQ=WEEKLY;BYDAY=MO,TU,WE,TH,FR,SA', start: '09:00', end: '21:00' } });
  serviceId = await insertPlannedService(db(), salon.salonId, { plan, name: 'Gloss refresh' });
  const desk = await insertUser(db(), salon.salonId, 'front_desk');
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
});
afterAll(() => t.close());

/** A new client reachable by e-mail and SMS (own number, so the fake's messages can be counted per client). */
async function newClient() {
  const client = await insertUser(db(), salon.salonId, 'client');
  const phone = `+1970555${String(2000 + ++phones)}`;
  await db().updateTable('clients').set({ phone }).where('id', '=', client.clientId!).execute();
  return { ...client, phone };
}

async function book(date: string, hhmm: string, clientId: string): Promise<string> {
  const res = await desk$.write('post', '/api/bookings', {
    clientId,
    serviceId,
    stepPlan: plan,
    stylistId: ana.staffId,
    start: localIso(date, hhmm),
    idempotencyKey: `msg-${date}-${hhmm}-${clientId}`,
  });
  expect(res.status).toBe(201);
  return res.body.id;
}

const messagesOf = (bookingId: string) =>
  db().selectFrom('messages').selectAll().where('booking_id', '=', bookingId).orderBy('send_at').orderBy('channel').execute();
const planned = async (bookingId: string) =>
  (await messagesOf(bookingId))
    .filter((m) => m.status !== 'dropped')
    .map((m) => `${m.kind} ${m.channel} ${m.kind === 'confirmation' ? '' : iso(m.send_at)}`.trim());
const smsTo = (phone: string) => t.sms.messages.filter((m) => m.to === phone);
async function reminderSms(bookingId: string, kind = 'reminder_48h') {
  return (await messagesOf(bookingId)).find((m) => m.kind === kind && m.channel === 'sms' && m.status !== 'dropped')!;
}

describe('planning a booking’s messages', () => {
  it('plans the confirmation now and the 48 h and 24 h reminders at salon time, across the spring daylight-saving change', async () => {
    // IANA time zone database (tzdata, through luxon/Intl), zone America/Denver: DST starts Sunday 2027-03-14
    // at 02:00 local (MST, UTC−7 → MDT, UTC−6).
    expect(DateTime.fromISO('2027-03-13T10:00', { zone: Z }).offset).toBe(-420);
    expect(DateTime.fromISO('2027-03-14T10:00', { zone: Z }).offset).toBe(-360);
    const c = await newClient();
    const before = Date.now();
    const id = await book('2027-03-15', '10:00', c.clientId!);
    // Sitting Mon 2027-03-15 10:00 MDT = 16:00Z. 24 h: Sun 03-14 10:00 MDT = 16:00Z.
    // 48 h: Sat 03-13 10:00 MST = 17:00Z (whole days on the salon's calendar, not 48 × 3600 s, which is 09:00 MST).
    expect(await planned(id)).toEqual([
      'confirmation email',
      'confirmation sms',
      'reminder_48h email 2027-03-13T17:00:00.000Z',
      'reminder_48h sms 2027-03-13T17:00:00.000Z',
      'reminder_24h email 2027-03-14T16:00:00.000Z',
      'reminder_24h sms 2027-03-14T16:00:00.000Z',
      // A colour service: aftercare the next day at 10:00 salon time (Tue 03-16 10:00 MDT = 16:00Z).
      'aftercare email 2027-03-16T16:00:00.000Z',
      'aftercare sms 2027-03-16T16:00:00.000Z',
    ]);
    const confirmation = (await messagesOf(id)).find((m) => m.kind === 'confirmation')!;
    expect(confirmation.send_at.getTime()).toBeGreaterThanOrEqual(before - 1000);
    const reminder = await reminderSms(id);
    expect(reminder.body).toMatch(/Test Salon .*reminder, Gloss refresh in 2 days.*Come with dry hair.*move or cancel/);
    expect(reminder.dedupe_key).toBe(`${id}:1:reminder_48h:sms:v1`);
  });

  it('and across the autumn change', async () => {
    // IANA tzdata, America/Denver: DST ends Sunday 2027-11-07 at 02:00 local (MDT, UTC−6 → MST, UTC−7).
    expect(DateTime.fromISO('2027-11-06T10:00', { zone: Z }).offset).toBe(-360);
    expect(DateTime.fromISO('2027-11-07T10:00', { zone: Z }).offset).toBe(-420);
    const c = await newClient();
    const id = await book('2027-11-08', '10:00', c.clientId!);
    // Sitting Mon 2027-11-08 10:00 MST = 17:00Z. 24 h: Sun 11-07 10:00 MST = 17:00Z. 48 h: Sat 11-06 10:00 MDT = 16:00Z.
    expect((await planned(id)).filter((p) => p.startsWith('reminder'))).toEqual([
      'reminder_48h email 2027-11-06T16:00:00.000Z',
      'reminder_48h sms 2027-11-06T16:00:00.000Z',
      'reminder_24h email 2027-11-07T17:00:00.000Z',
      'reminder_24h sms 2027-11-07T17:00:00.000Z',
    ]);
  });

  it('moving re-plans: reminders of older versions are dropped and only the latest go out', async () => {
    const c = await newClient();
    const id = await book('2027-02-16', '10:00', c.clientId!);
    for (const start of [localIso('2027-02-17', '11:00'), localIso('2027-02-18', '12:00')]) {
      expect((await desk$.write('post', `/api/bookings/${id}/move`, { sitting: 1, start })).status).toBe(200);
    }
    const rows = await messagesOf(id);
    expect(rows.filter((m) => m.kind.startsWith('reminder') && m.booking_version! < 3).every((m) => m.status === 'dropped')).toBe(true);
    // Thu 2027-02-18 12:00 MST = 19:00Z; reminders at 12:00 MST two days and one day before.
    expect((await planned(id)).filter((p) => p.startsWith('reminder'))).toEqual([
      'reminder_48h email 2027-02-16T19:00:00.000Z',
      'reminder_48h sms 2027-02-16T19:00:00.000Z',
      'reminder_24h email 2027-02-17T19:00:00.000Z',
      'reminder_24h sms 2027-02-17T19:00:00.000Z',
    ]);
    await sendDueMessages(db(), t.outside, new Date('2027-02-18T12:00:00Z'), id);
    const texts = smsTo(c.phone).map((m) => m.body);
    expect(texts.filter((b) => b.includes('reminder'))).toHaveLength(2);
    expect(texts.filter((b) => b.includes('reminder')).every((b) => b.includes('Thursday 18 February 2027 at 12:00 PM'))).toBe(true);
    expect(texts.some((b) => b.includes('moved'))).toBe(true);
  });

  it('cancelling drops every queued message and plans the cancellation', async () => {
    const c = await newClient();
    const id = await book('2027-02-19', '10:00', c.clientId!);
    expect((await desk$.write('post', `/api/bookings/${id}/cancel`, { reason: 'Client is ill' })).status).toBe(200);
    const rows = await messagesOf(id);
    expect(rows.filter((m) => m.kind.startsWith('reminder')).map((m) => m.status)).toEqual(['dropped', 'dropped', 'dropped', 'dropped']);
    expect(
      rows
        .filter((m) => m.kind === 'cancellation')
        .map((m) => m.channel)
        .sort(),
    ).toEqual(['email', 'sms']);
  });

  it('quiet hours move an SMS to the end of the quiet stretch in salon time; e-mail keeps its time', async () => {
    expect(iso(outOfQuietHours(new Date(localIso('2027-02-22', '22:30')), Z, '21:00:00', '08:00:00'))).toBe(iso(new Date(localIso('2027-02-23', '08:00'))));
    expect(iso(outOfQuietHours(new Date(localIso('2027-02-23', '07:00')), Z, '21:00:00', '08:00:00'))).toBe(iso(new Date(localIso('2027-02-23', '08:00'))));
    await db().updateTable('salons').set({ quiet_from: '19:00' }).where('id', '=', salon.salonId).execute();
    try {
      const c = await newClient();
      const id = await book('2027-02-24', '20:00', c.clientId!);
      // Wed 2027-02-24 20:00 MST = 2027-02-25T03:00Z. 24 h e-mail: Tue 20:00 MST = 2027-02-24T03:00Z; its SMS
      // falls in quiet hours (19:00–08:00) and moves to Wed 08:00 MST = 15:00Z.
      expect((await planned(id)).filter((p) => p.startsWith('reminder_24h'))).toEqual([
        'reminder_24h email 2027-02-24T03:00:00.000Z',
        'reminder_24h sms 2027-02-24T15:00:00.000Z',
      ]);
    } finally {
      await db().updateTable('salons').set({ quiet_from: '21:00' }).where('id', '=', salon.salonId).execute();
    }
  });
});

describe('sending exactly once', () => {
  it('retries with backoff while the SMS service fails, then sends once', async () => {
    await sendDueMessages(db(), t.outside, new Date()); // nothing else due may take the fake's failures
    const c = await newClient();
    const m = await reminderSms(await book('2027-03-02', '10:00', c.clientId!));
    const at = m.send_at.getTime();
    expect(await sendMessage(db(), t.outside, m.id, new Date(at - 60_000))).toBe('not-claimed'); // not due yet
    t.sms.failNext(2);
    expect(await sendMessage(db(), t.outside, m.id, new Date(at))).toBe('retry');
    let row = await db().selectFrom('messages').selectAll().where('id', '=', m.id).executeTakeFirstOrThrow();
    expect({ status: row.status, attempts: row.attempts, sendAt: iso(row.send_at) }).toEqual({
      status: 'queued',
      attempts: 1,
      sendAt: iso(new Date(at + 60_000)),
    });
    expect(row.last_error).toMatch(/unavailable/i);
    expect(await sendMessage(db(), t.outside, m.id, new Date(at + 60_000))).toBe('retry');
    row = await db().selectFrom('messages').selectAll().where('id', '=', m.id).executeTakeFirstOrThrow();
    expect(iso(row.send_at)).toBe(iso(new Date(at + 3 * 60_000))); // then 2 minutes
    expect(await sendMessage(db(), t.outside, m.id, new Date(at + 3 * 60_000))).toBe('sent');
    row = await db().selectFrom('messages').selectAll().where('id', '=', m.id).executeTakeFirstOrThrow();
    expect(row).toMatchObject({ status: 'sent', attempts: 3 });
    expect(row.provider_ref).toMatch(/^SM/);
    expect(smsTo(c.phone).filter((s) => s.body === m.body)).toHaveLength(1);
  });

  it('after five failures the message is failed and the desk sees it with its last error', async () => {
    await sendDueMessages(db(), t.outside, new Date());
    const c = await newClient();
    const m = await reminderSms(await book('2027-03-03', '10:00', c.clientId!));
    t.sms.failNext(5);
    let now = m.send_at.getTime();
    const outcomes: string[] = [];
    for (let i = 0; i < 5; i++) {
      outcomes.push(await sendMessage(db(), t.outside, m.id, new Date(now)));
      now += 2 ** i * 60_000; // 1, 2, 4, 8 minutes
    }
    expect(outcomes).toEqual(['retry', 'retry', 'retry', 'retry', 'failed']);
    expect(await sendMessage(db(), t.outside, m.id, new Date(now + 3_600_000))).toBe('not-claimed');
    expect(smsTo(c.phone).filter((s) => s.body === m.body)).toHaveLength(0);
    const list = await desk$.get('/api/messages?status=failed');
    expect(list.status).toBe(200);
    expect(list.body.messages.find((x: { id: string }) => x.id === m.id)).toMatchObject({
      status: 'failed',
      attempts: 5,
      channel: 'sms',
      lastError: expect.stringMatching(/unavailable/i),
    });
    const client$ = await signedInAgent(t.app, c.email, c.password);
    expect((await client$.get('/api/messages')).status).toBe(403);
  });

  it('a worker killed between claim and send: the sweep re-queues it and it is sent exactly once', async () => {
    const c = await newClient();
    const m = await reminderSms(await book('2027-03-04', '10:00', c.clientId!));
    const at = m.send_at.getTime();
    // The dead worker's claim: status sending, no provider reference, claimed long ago.
    await db()
      .updateTable('messages')
      .set({ status: 'sending', attempts: 1, claimed_at: new Date(at - 600_000) })
      .where('id', '=', m.id)
      .execute();
    expect(await sendMessage(db(), t.outside, m.id, new Date(at))).toBe('not-claimed'); // still claimed
    expect(await requeueStuckMessages(db(), new Date(at))).toBeGreaterThanOrEqual(1);
    await Promise.all([sendDueMessages(db(), t.outside, new Date(at)), sendDueMessages(db(), t.outside, new Date(at))]);
    await requeueStuckMessages(db(), new Date(at + 3_600_000)); // the sent row has a provider reference: left alone
    await sendDueMessages(db(), t.outside, new Date(at + 3_600_000), m.booking_id!);
    expect(smsTo(c.phone).filter((s) => s.body === m.body)).toHaveLength(1);
    expect(await db().selectFrom('messages').select(['status', 'attempts']).where('id', '=', m.id).executeTakeFirstOrThrow()).toEqual({
      status: 'sent',
      attempts: 2,
    });
  });

  it('two workers running the same message at once send one SMS', async () => {
    const c = await newClient();
    const m = await reminderSms(await book('2027-03-05', '10:00', c.clientId!));
    const outcomes = await Promise.all(Array.from({ length: 6 }, () => sendMessage(db(), t.outside, m.id, m.send_at)));
    expect(outcomes.filter((o) => o === 'sent')).toHaveLength(1);
    expect(smsTo(c.phone).filter((s) => s.body === m.body)).toHaveLength(1);
  });
});
