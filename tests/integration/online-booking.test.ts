import ICAL from 'ical.js';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import type { SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { onlineBookingSalon, type Agent, type OnlineSalon } from '../factories/online-hold';
import { futureWeekday, localIso } from '../setup/dates';
import { FAKE_CARDS } from '@server/fakes/payments-fake';
import { LAPSE_HOLD_JOB } from '@server/features/online-booking/holds.service';
import { sendDueMessages } from '@server/features/messages/send-message.job';
import { emptyHairHistory } from '@shared/schemas/hair-history.schemas';
import { insertTestBooking } from '../factories/booking';
import { DateTime } from 'luxon';
import { eventually, listenForPaymentWebhooks, payOnHostedPage } from '../setup/hosted-payment';

let t: TestApp;
let salon: SalonFixture;
let slug: string;
let ana: UserFixture;
let consultation: string;
let secrets: Record<string, string>;
let hold: OnlineSalon['hold'];
let claimedBy: OnlineSalon['claimedBy'];
let webhooks: Awaited<ReturnType<typeof listenForPaymentWebhooks>>;
const tuesday = futureWeekday(2, 2);

beforeAll(async () => {
  t = await startTestApp();
  webhooks = await listenForPaymentWebhooks(t);
  ({ salon, slug, ana, consultation, secrets, hold, claimedBy } = await onlineBookingSalon(t));
});
afterAll(async () => {
  await webhooks.close();
  await t.close();
});

describe('public pages', () => {
  it('show services, hours and policies, and free times — nothing about any client', async () => {
    const visitor = await anonymousAgent(t.app);
    const page = await visitor.get(`/api/public/salons/${slug}`);
    expect(page.status).toBe(200);
    // The skill is what a stylist needs to be offered for it (the factory's consultation is colour work).
    expect(page.body.services.find((s: { id: string }) => s.id === consultation)).toMatchObject({ onlineBookable: true, depositCents: 2500, skill: 'colour' });
    expect(page.body.openingHours[0]).toBe('Tuesday to Saturday, 9:00 AM – 9:00 PM'); // the format policy: the salon locale's clock
    const times = await visitor.get(`/api/public/salons/${slug}/availability?serviceId=${consultation}&from=${tuesday}`);
    expect(times.body.times[0]).toMatchObject({ start: localIso(tuesday, '09:00'), stylistId: ana.staffId });
    expect(JSON.stringify(times.body)).not.toMatch(/client|email|phone/i);
  });
});

describe('holds', () => {
  it('of ten visitors racing for one time, one holds it and the time is no longer offered', async () => {
    const start = localIso(tuesday, '10:00');
    const results = await Promise.all(Array.from({ length: 10 }, () => hold(start)));
    expect(results.filter((r) => r.status === 201)).toHaveLength(1);
    expect(results.filter((r) => r.status === 409)).toHaveLength(9);
    const times = await (await anonymousAgent(t.app)).get(`/api/public/salons/${slug}/availability?serviceId=${consultation}&from=${tuesday}`);
    expect(times.body.times.map((x: { start: string }) => x.start)).not.toContain(start);
  });

  it('an unpaid hold lapses through the job queue and frees the time', async () => {
    const held = await hold(localIso(tuesday, '11:00'));
    await t.testDb.db
      .updateTable('bookings')
      .set({ held_until: new Date(Date.now() - 1000) })
      .where('id', '=', held.body.holdId)
      .execute();
    await t.jobs.schedule(LAPSE_HOLD_JOB, { bookingId: held.body.holdId }, new Date());
    for (let i = 0; i < 40; i++) {
      if (!(await t.testDb.db.selectFrom('bookings').select('id').where('id', '=', held.body.holdId).executeTakeFirst())) break;
      await new Promise((r) => setTimeout(r, 250));
    }
    expect(await t.testDb.db.selectFrom('bookings').select('id').where('id', '=', held.body.holdId).executeTakeFirst()).toBeUndefined();
    expect((await hold(localIso(tuesday, '11:00'))).status).toBe(201);
  });

  it('cannot be claimed signed out or with the wrong secret', async () => {
    const held = await hold(localIso(tuesday, '12:00'));
    const visitor = await anonymousAgent(t.app);
    expect((await visitor.write('post', `/api/me/holds/${held.body.holdId}/claim`, { secret: held.body.holdSecret })).status).toBe(401);
    const client = await insertUser(t.testDb.db, salon.salonId, 'client');
    const c = await signedInAgent(t.app, client.email, client.password);
    expect((await c.write('post', `/api/me/holds/${held.body.holdId}/claim`, { secret: 'x'.repeat(32) })).status).toBe(404);
  });
});

describe('races for one hold', () => {
  const thursday = futureWeekday(4, 2);
  it('five clients claiming one hold at once: one owns it, every other is refused', async () => {
    const held = await hold(localIso(thursday, '10:00'));
    const clients = await Promise.all([1, 2, 3, 4, 5].map(() => insertUser(t.testDb.db, salon.salonId, 'client')));
    const agents = await Promise.all(clients.map((c) => signedInAgent(t.app, c.email, c.password)));
    const claims = await Promise.all(agents.map((c) => c.write('post', `/api/me/holds/${held.body.holdId}/claim`, { secret: held.body.holdSecret })));
    // A claim that loses the race is 409; one that comes after the winner's has landed finds the hold not theirs (404).
    expect(claims.filter((r) => r.status === 200)).toHaveLength(1);
    expect(claims.filter((r) => r.status !== 200).every((r) => r.status === 409 || r.status === 404)).toBe(true);
    const winner = clients[claims.findIndex((r) => r.status === 200)]!;
    const row = await t.testDb.db.selectFrom('bookings').select('client_id').where('id', '=', held.body.holdId).executeTakeFirstOrThrow();
    expect(row.client_id).toBe(winner.clientId);
  });
});

describe('deposit and confirmation', () => {
  it('a paid hold becomes booked; the e-mail carries an .ics that parses to the same start, end and zone; an SMS goes out', async () => {
    const { c, client, id } = await claimedBy(localIso(tuesday, '13:00'));
    const withoutSecret = await c.write('post', `/api/me/holds/${id}/pay`, {});
    expect(withoutSecret.body.error.fields.secret).toBeDefined();
    // The card goes to the payment service's own page; Dwell's pay call takes no card, and no amount either.
    const withCard = await c.write('post', `/api/me/holds/${id}/pay`, { secret: secrets[id], card: { number: '4242424242424242' } });
    expect(withCard.status).toBe(400);
    await payAndBook(c, id);
    const payment = await t.testDb.db.selectFrom('payments').selectAll().where('booking_id', '=', id).executeTakeFirstOrThrow();
    expect(payment).toMatchObject({ status: 'succeeded', kind: 'deposit', method: 'card', amount_cents: 2500 });
    const mail = await waitFor(() => t.smtp.messages.find((m) => m.to === client.email));
    const ics = mail.attachments.find((a) => a.filename === 'booking.ics')!;
    // RFC 5545 check with an independent parser (ical.js): DTSTART/DTEND are the booked instants.
    const event = new ICAL.Component(ICAL.parse(ics.content)).getFirstSubcomponent('vevent')!;
    expect((event.getFirstPropertyValue('dtstart') as ICAL.Time).toJSDate().toISOString()).toBe(new Date(localIso(tuesday, '13:00')).toISOString());
    expect((event.getFirstPropertyValue('dtend') as ICAL.Time).toJSDate().toISOString()).toBe(new Date(localIso(tuesday, '13:30')).toISOString());
    expect((event.getFirstPropertyValue('dtstart') as ICAL.Time).zone?.tzid).toBe('UTC');
    // A background send job may have claimed the text first; either way it arrives once.
    await waitFor(() => t.sms.messages.find((m) => m.to === '+19705550177' && m.body.includes('booked')));
    expect(t.sms.messages.filter((m) => m.to === '+19705550177' && m.body.includes('booked'))).toHaveLength(1);
  });

  it("a declined card is said on the payment service's page and leaves the hold held", async () => {
    const { c, id } = await claimedBy(localIso(tuesday, '14:00'));
    const { checkoutUrl } = (await c.write('post', `/api/me/holds/${id}/pay`, { secret: secrets[id] })).body;
    const page = await payOnHostedPage(checkoutUrl, FAKE_CARDS.declined);
    expect(page.status).toBe(402);
    expect(page.html).toMatch(/declined/);
    expect((await t.testDb.db.selectFrom('bookings').select('status').where('id', '=', id).executeTakeFirstOrThrow()).status).toBe('held');
  });

  it('the client sees the deposit rule, then cancels; another client cannot', async () => {
    const { c, id } = await claimedBy(localIso(tuesday, '16:00'));
    await payAndBook(c, id);
    // The client's own moves stay outside the 48-hour window, where the deposit would stop being refundable.
    const times = await c.get(`/api/me/bookings/${id}/move-times`);
    expect(times.status).toBe(200);
    expect(times.body.times.every((x: { start: string }) => Date.parse(x.start) - Date.now() >= 48 * 3_600_000)).toBe(true);
    // Its own time is not offered: moving there would change nothing.
    expect(times.body.times.map((x: { start: string }) => Date.parse(x.start))).not.toContain(Date.parse(localIso(tuesday, '16:00')));
    const soon = new Date(Math.ceil((Date.now() + 24 * 3_600_000) / 300_000) * 300_000).toISOString();
    const tooClose = await c.write('post', `/api/me/bookings/${id}/move`, { start: soon });
    expect(tooClose.status).toBe(409);
    expect(tooClose.body.error.message).toMatch(/non-refundable/);
    const terms = await c.get(`/api/me/bookings/${id}/cancel-terms`);
    expect(terms.body).toMatchObject({ depositOutcome: 'refunded' });
    const stranger = await insertUser(t.testDb.db, salon.salonId, 'client');
    const s = await signedInAgent(t.app, stranger.email, stranger.password);
    expect((await s.write('post', `/api/me/bookings/${id}/cancel`, {})).status).toBe(404);
    expect((await s.get(`/api/me/bookings/${id}/calendar.ics`)).status).toBe(404);
    const cancelled = await c.write('post', `/api/me/bookings/${id}/cancel`, {});
    expect(cancelled.body).toMatchObject({ status: 'cancelled', depositOutcome: 'refunded' });
  });
});

describe('outside services failing or slow', () => {
  const charges = (bookingId: string) => t.payments.charges().filter((p) => p.metadata.booking === bookingId);
  const sessions = (bookingId: string) => [...t.payments.sessions.values()].filter((x) => x.metadata.booking === bookingId);

  it('a payments outage on the first try is retried by the SDK with the same idempotency key: one page, booked, charged once', async () => {
    const { c, id } = await claimedBy(localIso(tuesday, '17:00'));
    t.payments.failNext(1);
    await payAndBook(c, id);
    expect(sessions(id)).toHaveLength(1);
    expect(charges(id)).toHaveLength(1);
  });

  it('a payment page opened late is waited for, and a repeated pay request gets the same page: charged once', async () => {
    const { c, id } = await claimedBy(localIso(tuesday, '17:30'));
    t.payments.slowNext(2, 1_500);
    const [first, again] = await Promise.all([0, 1].map(() => c.write('post', `/api/me/holds/${id}/pay`, { secret: secrets[id] })));
    expect([first!.status, again!.status]).toEqual([200, 200]);
    expect(again!.body.checkoutUrl).toBe(first!.body.checkoutUrl);
    expect(sessions(id)).toHaveLength(1);
    expect((await payOnHostedPage(first!.body.checkoutUrl, FAKE_CARDS.succeeds)).status).toBe(303);
    await eventually(async () => (await statusOf(id)) === 'booked');
    expect(charges(id)).toHaveLength(1);
    expect(await t.testDb.db.selectFrom('payments').select('status').where('booking_id', '=', id).execute()).toEqual([{ status: 'succeeded' }]);
  });

  it('a slow SMS provider does not hold the payment answer; the text arrives later, once', async () => {
    const { c, client, id } = await claimedBy(localIso(tuesday, '09:00'));
    const phone = '+19705550178';
    await t.testDb.db.updateTable('clients').set({ phone }).where('id', '=', client.clientId!).execute();
    t.sms.slowNext(1, 5_000);
    const { checkoutUrl } = (await c.write('post', `/api/me/holds/${id}/pay`, { secret: secrets[id] })).body;
    const delivered = t.payments.deliveries.length;
    const started = Date.now();
    expect((await payOnHostedPage(checkoutUrl, FAKE_CARDS.succeeds)).status).toBe(303);
    // The webhook's answer waits for the confirmation at most 2 s (its CONFIRMATION_WAIT_MS), not the 5 s of the SMS.
    await eventually(async () => t.payments.deliveries.length > delivered);
    const waited = Date.now() - started;
    expect(t.payments.deliveries.at(-1)!.status).toBe(200);
    expect(waited).toBeLessThan(4_500);
    for (let i = 0; i < 80 && !t.sms.messages.some((m) => m.to === phone); i++) await new Promise((r) => setTimeout(r, 100));
    expect(t.sms.messages.filter((m) => m.to === phone && m.body.includes('booked'))).toHaveLength(1);
  });

  it('an e-mail the SMTP server refuses for now (451) is retried after its backoff and delivered once', async () => {
    const { c, client, id } = await claimedBy(localIso(tuesday, '09:30'));
    t.smtp.failNext(1);
    await payAndBook(c, id);
    // The webhook's first try at the e-mail was refused; the row waits for its backoff.
    await eventually(
      async () =>
        (
          await t.testDb.db
            .selectFrom('messages')
            .select(['attempts', 'status'])
            .where('booking_id', '=', id)
            .where('channel', '=', 'email')
            .where('kind', '=', 'confirmation')
            .where('status', '=', 'queued')
            .executeTakeFirst()
        )?.attempts === 1,
    );
    const row = await t.testDb.db
      .selectFrom('messages')
      .selectAll()
      .where('booking_id', '=', id)
      .where('channel', '=', 'email')
      .where('kind', '=', 'confirmation')
      .executeTakeFirstOrThrow();
    expect(row).toMatchObject({ status: 'queued', attempts: 1 });
    expect(row.last_error).toMatch(/451|Try again later/);
    expect(t.smtp.messages.filter((m) => m.to === client.email)).toHaveLength(0);
    // One minute later (the first backoff) the send pass delivers it.
    await sendDueMessages(t.testDb.db, t.outside, new Date(Date.now() + 61_000), id);
    expect(t.smtp.messages.filter((m) => m.to === client.email)).toHaveLength(1);
    await sendDueMessages(t.testDb.db, t.outside, new Date(Date.now() + 600_000), id);
    expect(t.smtp.messages.filter((m) => m.to === client.email && m.subject.match(/booked|confirm/i))).toHaveLength(1);
  });
});

describe('one unpaid hold per client', () => {
  const wednesday = futureWeekday(3, 2);
  const stepOf = async (c: Agent) => (await c.get('/api/me/holds')).body.holds.map((h: { holdId: string; step: string }) => [h.holdId, h.step]);

  it('a client who holds a time is sent back to it: a second hold, made signed in or claimed after signing in, is refused naming the first', async () => {
    const { c, id } = await claimedBy(localIso(wednesday, '09:00'));
    const second = await c.write('post', '/api/public/holds', {
      salonSlug: slug,
      serviceId: consultation,
      stylistId: ana.staffId,
      start: localIso(wednesday, '10:00'),
    });
    expect(second.status).toBe(409);
    expect(second.body.error.code).toBe('HOLD_OPEN');
    expect(second.body.error.message).toMatch(/already have a time held: Consultation on Wednesday .* at 9:00 AM/);
    // A hold made before signing in (another tab) cannot be claimed next to it either.
    const elsewhere = await hold(localIso(wednesday, '10:30'));
    const claim = await c.write('post', `/api/me/holds/${elsewhere.body.holdId}/claim`, { secret: elsewhere.body.holdSecret });
    expect(claim.body.error.code).toBe('HOLD_OPEN');
    // Its cautions were accepted, so it resumes at the deposit.
    expect(await stepOf(c)).toEqual([[id, 'deposit']]);
  });

  it('two tabs claiming two holds at once: the database keeps one for the client', async () => {
    const [one, two] = [await hold(localIso(wednesday, '11:00')), await hold(localIso(wednesday, '11:30'))];
    const client = await insertUser(t.testDb.db, salon.salonId, 'client');
    const c = await signedInAgent(t.app, client.email, client.password);
    const claims = await Promise.all([one, two].map((h) => c.write('post', `/api/me/holds/${h.body.holdId}/claim`, { secret: h.body.holdSecret })));
    expect(claims.map((r) => r.status).sort()).toEqual([200, 409]);
    expect((await c.get('/api/me/holds')).body.holds).toHaveLength(1);
  });

  it('resume goes back to the step reached, with a new secret (the old one stops working), and pays', async () => {
    const { c, id, secret } = await claimedBy(localIso(wednesday, '12:00'), false);
    expect(await stepOf(c)).toEqual([[id, 'details']]);
    // The details step's one action saves the hair history: after it, the cautions.
    const answers = { ...emptyHairHistory(), previousReaction: { answer: 'no', details: '' } };
    expect((await c.write('put', '/api/me/hair-history', answers)).status).toBe(200);
    expect(await stepOf(c)).toEqual([[id, 'cautions']]);
    const resumed = await c.write('post', `/api/me/holds/${id}/resume`, {});
    expect(resumed.status).toBe(200);
    expect(resumed.body).toMatchObject({ holdId: id, salonSlug: slug, serviceId: consultation, step: 'cautions', status: 'held' });
    expect(resumed.body.holdSecret).not.toBe(secret);
    expect((await c.write('post', `/api/me/holds/${id}/cautions`, { version: resumed.body.cautions.version, secret })).status).toBe(404);
    expect((await c.write('post', `/api/me/holds/${id}/cautions`, { version: resumed.body.cautions.version, secret: resumed.body.holdSecret })).status).toBe(
      204,
    );
    expect(await stepOf(c)).toEqual([[id, 'deposit']]);
    secrets[id] = resumed.body.holdSecret;
    await payAndBook(c, id);
    expect((await c.get('/api/me/holds')).body.holds).toEqual([]);
    expect((await c.write('post', `/api/me/holds/${id}/resume`, {})).status).toBe(409); // booked, nothing to resume
  });

  it('release frees the time at once; only the client (or, before a claim, the holder of the secret) may release it', async () => {
    const start = localIso(wednesday, '13:00');
    const { c, id } = await claimedBy(start, false);
    const free = async () =>
      (
        await (await anonymousAgent(t.app)).get(`/api/public/salons/${slug}/availability?serviceId=${consultation}&stylistId=${ana.staffId}&from=${wednesday}`)
      ).body.times.map((x: { start: string }) => x.start);
    expect(await free()).not.toContain(start);
    const stranger = await insertUser(t.testDb.db, salon.salonId, 'client');
    const s = await signedInAgent(t.app, stranger.email, stranger.password);
    expect((await s.write('post', `/api/me/holds/${id}/release`, {})).status).toBe(404);
    expect((await s.get('/api/me/holds')).body.holds).toEqual([]); // nobody else's hold is listed
    expect((await (await anonymousAgent(t.app)).write('post', `/api/me/holds/${id}/release`, {})).status).toBe(401);
    expect((await c.write('post', `/api/me/holds/${id}/release`, {})).status).toBe(204);
    expect(await free()).toContain(start);
    expect((await hold(start)).status).toBe(201);
    expect((await c.write('post', `/api/me/holds/${id}/release`, {})).body.error.code).toBe('HOLD_LAPSED');
    // A hold nobody has claimed yet: its secret is the proof.
    const unclaimed = await hold(localIso(wednesday, '14:00'));
    expect((await s.write('post', `/api/me/holds/${unclaimed.body.holdId}/release`, {})).status).toBe(404);
    expect((await s.write('post', `/api/me/holds/${unclaimed.body.holdId}/release`, { secret: unclaimed.body.holdSecret })).status).toBe(204);
  });
});

describe('the confirmation page reads the send log', () => {
  it('says a text held back by quiet hours goes when they end, and that the e-mail went', async () => {
    // Quiet hours from an hour ago to two hours from now, salon time (Denver): the confirmation text must wait for their end.
    const now = DateTime.now().setZone('America/Denver');
    const quiet = { quiet_from: now.minus({ hours: 1 }).toFormat('HH:mm'), quiet_to: now.plus({ hours: 2 }).toFormat('HH:mm') };
    await t.testDb.db.updateTable('salons').set(quiet).where('id', '=', salon.salonId).execute();
    try {
      const { c, id } = await claimedBy(localIso(futureWeekday(4, 2), '09:00'));
      await payAndBook(c, id);
      const res = await c.get(`/api/me/bookings/${id}/confirmation`);
      expect(res.status).toBe(200);
      expect(res.body.quietHours).toEqual({ from: quiet.quiet_from, to: quiet.quiet_to });
      const sms = res.body.sends.find((x: { channel: string }) => x.channel === 'sms');
      // By hand: the wall clock next reads quiet_to two hours from now, to the minute.
      expect(sms).toMatchObject({ status: 'waiting', sentAt: null });
      expect(Date.parse(sms.sendAt)).toBe(now.plus({ hours: 2 }).startOf('minute').toMillis());
      expect(res.body.sends.find((x: { channel: string }) => x.channel === 'email').status).toMatch(/^(sent|sending)$/);
      const stranger = await insertUser(t.testDb.db, salon.salonId, 'client');
      expect((await (await signedInAgent(t.app, stranger.email, stranger.password)).get(`/api/me/bookings/${id}/confirmation`)).status).toBe(404);
    } finally {
      await t.testDb.db.updateTable('salons').set({ quiet_from: '00:00', quiet_to: '00:00' }).where('id', '=', salon.salonId).execute();
    }
  });
});

describe("the owner's figures", () => {
  it('leave unpaid holds out of the week: no booking counted, no chair time', async () => {
    const owner = await insertUser(t.testDb.db, salon.salonId, 'owner');
    const o = await signedInAgent(t.app, owner.email, owner.password);
    const week = async () => (await o.get('/api/owner/overview')).body.week;
    const before = await week();
    // This week's Wednesday 10:00–10:30, salon time (past or not: figures count the whole week).
    const day = DateTime.now().setZone('America/Denver').startOf('week').plus({ days: 2 }).toISODate()!;
    const client = await insertUser(t.testDb.db, salon.salonId, 'client');
    const id = await insertTestBooking(t.testDb.db, {
      salonId: salon.salonId,
      clientId: client.clientId!,
      stylistId: ana.staffId!,
      chairId: salon.chairs[1]!,
      serviceId: consultation,
      steps: [['hands_on', localIso(day, '10:00'), localIso(day, '10:30')]],
    });
    await t.testDb.db
      .updateTable('bookings')
      .set({ status: 'held', held_until: new Date(Date.now() + 600_000) })
      .where('id', '=', id)
      .execute();
    const held = await week();
    expect(held.bookings).toBe(before.bookings);
    expect(held.chairOccupancy).toBe(before.chairOccupancy);
    // Once booked it counts: 30 more chair minutes of 2 chairs × 720 open minutes × 5 days (Tue–Sat 09:00–21:00) = 7200.
    await t.testDb.db.updateTable('bookings').set({ status: 'booked', held_until: null }).where('id', '=', id).execute();
    const booked = await week();
    expect(booked.bookings).toBe(before.bookings + 1);
    expect(booked.chairOccupancy).toBeCloseTo((before.chairOccupancy ?? 0) + 30 / 7200, 10);
  });
});

const statusOf = async (id: string) => (await t.testDb.db.selectFrom('bookings').select('status').where('id', '=', id).executeTakeFirst())?.status;

/** Pays the hold's deposit on the payment service's hosted page and waits for its webhook to book it. */
async function payAndBook(c: Agent, id: string) {
  const pay = await c.write('post', `/api/me/holds/${id}/pay`, { secret: secrets[id] });
  expect(pay.status).toBe(200);
  const page = await payOnHostedPage(pay.body.checkoutUrl, FAKE_CARDS.succeeds);
  expect(page.status).toBe(303);
  expect(page.location).toMatch(new RegExp(`/me/holds/${id}/paid$`));
  await eventually(async () => (await statusOf(id)) === 'booked');
}

async function waitFor<T>(find: () => T | undefined): Promise<T> {
  for (let i = 0; i < 40; i++) {
    const found = find();
    if (found) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('not found in time');
}
