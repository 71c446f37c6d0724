import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { startTestApp, type TestApp } from '../setup/test-app';
import { eventually, listenForPaymentWebhooks, payOnHostedPage } from '../setup/hosted-payment';
import { futureWeekday, localIso } from '../setup/dates';
import { onlineBookingSalon, type OnlineSalon } from '../factories/online-hold';
import { FAKE_CARDS } from '@server/fakes/payments-fake';
import { FAKE_STRIPE } from '@server/services';
import { lapseHolds } from '@server/features/online-booking/holds.repository';
import { makePendingRefunds } from '@server/features/payments';
import { findPostgresBin } from '@server/ops/postgres-cluster';

let t: TestApp;
let shop: OnlineSalon;
let webhooks: Awaited<ReturnType<typeof listenForPaymentWebhooks>>;
const wednesday = futureWeekday(3, 3);
const stripe = new Stripe('sk_test_local_fake');

// Everything the server process writes while the suite runs (the app, its jobs and the fakes share it).
const log: string[] = [];
const keep = (chunk: unknown) => void log.push(typeof chunk === 'string' ? chunk : Buffer.isBuffer(chunk) ? chunk.toString() : JSON.stringify(chunk));

beforeAll(async () => {
  for (const stream of [process.stdout, process.stderr]) {
    const write = stream.write.bind(stream);
    vi.spyOn(stream, 'write').mockImplementation(((chunk: unknown, ...rest: never[]) => (keep(chunk), write(chunk as string, ...rest))) as typeof stream.write);
  }
  for (const level of ['log', 'info', 'warn', 'error'] as const) {
    const original = console[level].bind(console);
    vi.spyOn(console, level).mockImplementation((...args: unknown[]) => (args.forEach(keep), original(...args)));
  }
  t = await startTestApp();
  webhooks = await listenForPaymentWebhooks(t);
  shop = await onlineBookingSalon(t);
});
afterAll(async () => {
  vi.restoreAllMocks();
  await webhooks.close();
  await t.close();
});

const db = () => t.testDb.db;
const statusOf = async (id: string) => (await db().selectFrom('bookings').select('status').where('id', '=', id).executeTakeFirst())?.status;
const sessionsOf = (id: string) => [...t.payments.sessions.values()].filter((s) => s.metadata.booking === id);
const chargesOf = (id: string) => t.payments.charges().filter((p) => p.metadata.booking === id);
const moneyOf = (id: string) =>
  db().selectFrom('payments').select(['kind', 'status', 'amount_cents', 'method']).where('booking_id', '=', id).orderBy('created_at').execute();
const pay = (c: Awaited<ReturnType<OnlineSalon['claimedBy']>>['c'], id: string) => c.write('post', `/api/me/holds/${id}/pay`, { secret: shop.secrets[id] });

/** The provider's webhook as it would post it, signed with `secret` at `timestamp` (the SDK's own test helper). */
function signed(event: unknown, { secret = FAKE_STRIPE.webhookSecret, timestamp }: { secret?: string; timestamp?: number } = {}) {
  const payload = JSON.stringify(event);
  return { payload, header: stripe.webhooks.generateTestHeaderString({ payload, secret, timestamp }) };
}
const postWebhook = (payload: string, header?: string) =>
  fetch(`${webhooks.url}/webhooks/payments`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', ...(header ? { 'stripe-signature': header } : {}) },
    body: payload,
  });

describe('paying a held time on the hosted page', () => {
  it("pay answers the payments fake's own page, opened through the SDK with the server's amount and Dwell's return addresses", async () => {
    const { c, id } = await shop.claimedBy(localIso(wednesday, '09:00'));
    // The amount is the server's: a client cannot send one (unknown fields are refused).
    expect((await c.write('post', `/api/me/holds/${id}/pay`, { secret: shop.secrets[id], amountCents: 1 })).status).toBe(400);
    const res = await pay(c, id);
    expect(res.status).toBe(200);
    expect(res.body.checkoutUrl).toMatch(new RegExp(`^http://127\\.0\\.0\\.1:${t.payments.url.port}/pay/cs_test_`));
    const [session] = sessionsOf(id);
    // ISO 4217 USD has 2 decimals: the $25.00 deposit is 2500 minor units, sent as is.
    expect(session).toMatchObject({ mode: 'payment', amount_total: 2500, currency: 'usd', status: 'open' });
    expect(session!.success_url).toMatch(new RegExp(`/me/holds/${id}/paid$`));
    expect(session!.cancel_url).toContain(`/salon/${shop.slug}/book?service=${shop.consultation}&payment=cancelled`);
    const page = await (await fetch(res.body.checkoutUrl)).text();
    expect(page).toContain('$25.00');
    expect(page).toContain('Card number');
    const stored = await db().selectFrom('checkout_sessions').selectAll().where('booking_id', '=', id).execute();
    expect(stored).toMatchObject([{ status: 'open', amount_cents: 2500, provider_session_id: session!.id }]);
  });

  it('10 pay attempts at once on one hold open one page; two tabs paying it make one charge', async () => {
    const { c, id } = await shop.claimedBy(localIso(wednesday, '10:00'));
    const answers = await Promise.all(Array.from({ length: 10 }, () => pay(c, id)));
    expect(answers.map((a) => a.status)).toEqual(Array(10).fill(200));
    expect(new Set(answers.map((a) => a.body.checkoutUrl)).size).toBe(1);
    expect(sessionsOf(id)).toHaveLength(1);
    expect(await db().selectFrom('checkout_sessions').select('id').where('booking_id', '=', id).execute()).toHaveLength(1);
    const url = answers[0]!.body.checkoutUrl;
    const tabs = await Promise.all([payOnHostedPage(url, FAKE_CARDS.succeeds), payOnHostedPage(url, FAKE_CARDS.succeeds)]);
    expect(tabs.map((p) => p.status).sort()).toEqual([200, 303]); // the second finds it paid
    await eventually(async () => (await statusOf(id)) === 'booked');
    expect(chargesOf(id)).toHaveLength(1);
    expect(await moneyOf(id)).toEqual([{ kind: 'deposit', status: 'succeeded', amount_cents: 2500, method: 'card' }]);
    // Asked again after paying: booked, nothing more to pay.
    expect((await pay(c, id)).body).toEqual({ checkoutUrl: null });
  });

  it('a declined card is told on the page and may be followed by another card; the 3155 card asks for a confirmation first', async () => {
    const { c, id } = await shop.claimedBy(localIso(wednesday, '11:00'));
    const url = (await pay(c, id)).body.checkoutUrl;
    const declined = await payOnHostedPage(url, FAKE_CARDS.declined);
    expect(declined.status).toBe(402);
    expect(declined.html).toContain('Your card was declined. Try another card.');
    expect(await statusOf(id)).toBe('held');
    // The extra step: refusing it charges nothing and the form comes back; confirming it pays.
    const refused = await payOnHostedPage(url, FAKE_CARDS.extraStep, 'refuse');
    expect(refused.status).toBe(402);
    expect(refused.html).toContain('not confirmed');
    expect(chargesOf(id)).toHaveLength(0);
    const page = await fetch(url, { method: 'POST', body: new URLSearchParams({ number: FAKE_CARDS.extraStep, expiry: '12/31', cvc: '123' }) });
    expect(await page.text()).toContain('Confirm this payment');
    expect(chargesOf(id)).toHaveLength(0);
    const confirmed = await payOnHostedPage(url, FAKE_CARDS.extraStep, 'confirm');
    expect(confirmed.status).toBe(303);
    await eventually(async () => (await statusOf(id)) === 'booked');
    expect(chargesOf(id)).toHaveLength(1);
  });
});

describe('the webhook', () => {
  it('refuses a forged, altered or unsigned event with 400 and changes nothing', async () => {
    const { c, id } = await shop.claimedBy(localIso(wednesday, '12:00'));
    await pay(c, id);
    const [session] = sessionsOf(id);
    const forged = {
      id: 'evt_forged_0001',
      object: 'event',
      type: 'checkout.session.completed',
      created: Math.floor(Date.now() / 1000),
      data: { object: { ...session, status: 'complete', payment_status: 'paid', payment_intent: 'pi_forged' } },
    };
    const wrongKey = signed(forged, { secret: 'whsec_someone_else' });
    const good = signed(forged);
    for (const res of [
      await postWebhook(wrongKey.payload, wrongKey.header),
      await postWebhook(good.payload.replace('"amount_total":2500', '"amount_total":1'), good.header),
      await postWebhook(good.payload),
    ]) {
      expect(res.status).toBe(400);
      expect(((await res.json()) as { error: { code: string } }).error.code).toBe('BAD_SIGNATURE');
    }
    expect(await statusOf(id)).toBe('held');
    expect(await moneyOf(id)).toEqual([]);
    expect(await db().selectFrom('payment_events').select('event_id').where('event_id', '=', forged.id).execute()).toEqual([]);
  });

  it('is idempotent: a replayed delivery and a second event about the same payment record nothing more; a stale signature is refused', async () => {
    const { c, id } = await shop.claimedBy(localIso(wednesday, '13:00'));
    expect((await payOnHostedPage((await pay(c, id)).body.checkoutUrl, FAKE_CARDS.succeeds)).status).toBe(303);
    await eventually(async () => (await statusOf(id)) === 'booked');
    const completed = t.payments.events.find(
      (e) => e.type === 'checkout.session.completed' && (e.data.object as { metadata: { booking: string } }).metadata.booking === id,
    )!;
    // The same event again, freshly signed (the provider retrying): answered, nothing changes.
    const again = signed(completed);
    const replay = await postWebhook(again.payload, again.header);
    expect(replay.status).toBe(200);
    expect(await replay.json()).toEqual({ received: true, duplicate: true });
    // Another event id about the same payment: the payment is recorded once.
    const other = signed({ ...completed, id: `${completed.id}_other` });
    const second = await postWebhook(other.payload, other.header);
    expect(await second.json()).toEqual({ received: true, duplicate: false });
    // A delivery signed longer ago than the SDK's tolerance (300 s) is a replay from outside: refused.
    const stale = signed({ ...completed, id: `${completed.id}_stale` }, { timestamp: Math.floor(Date.now() / 1000) - 600 });
    expect((await postWebhook(stale.payload, stale.header)).status).toBe(400);
    expect(await moneyOf(id)).toEqual([{ kind: 'deposit', status: 'succeeded', amount_cents: 2500, method: 'card' }]);
    expect(chargesOf(id)).toHaveLength(1);
  });

  it('a payment confirmed after its hold lapsed is refunded once and the client told', async () => {
    const { c, client, id } = await shop.claimedBy(localIso(wednesday, '14:00'));
    const url = (await pay(c, id)).body.checkoutUrl;
    t.payments.holdWebhooks(); // the provider is late
    expect((await payOnHostedPage(url, FAKE_CARDS.succeeds)).status).toBe(303);
    await db()
      .updateTable('bookings')
      .set({ held_until: new Date(Date.now() - 1000) })
      .where('id', '=', id)
      .execute();
    expect(await lapseHolds(db(), new Date(), id)).toBe(1);
    expect(await t.payments.releaseHeld()).toEqual([200]);
    const [charge] = chargesOf(id);
    expect(t.payments.refunds.filter((r) => r.payment_intent === charge!.id).map((r) => r.amount)).toEqual([2500]);
    expect(await moneyOf(id)).toEqual([
      { kind: 'deposit', status: 'succeeded', amount_cents: 2500, method: 'card' },
      { kind: 'refund', status: 'succeeded', amount_cents: 2500, method: 'card' },
    ]);
    const told = await db()
      .selectFrom('messages')
      .select(['kind', 'channel', 'body'])
      .where('client_id', '=', client.clientId!)
      .where('kind', '=', 'payment_refunded')
      .execute();
    expect(told.map((m) => m.channel).sort()).toEqual(['email', 'sms']);
    expect(told[0]!.body).toMatch(/after your held time was released, so it is refunded in full/);
    // Delivered again, and the refund pass run again: still one refund.
    const completed = t.payments.events.find(
      (e) => e.type === 'checkout.session.completed' && (e.data.object as { metadata: { booking: string } }).metadata.booking === id,
    )!;
    expect(await t.payments.resend(completed.id)).toBe(200);
    await makePendingRefunds(db(), t.outside.payments);
    expect(t.payments.refunds.filter((r) => r.payment_intent === charge!.id)).toHaveLength(1);
    expect(await moneyOf(id)).toHaveLength(2);
  });

  it('a refund made at the provider that arrives before the payment it refunds: both recorded, nothing refunded twice', async () => {
    const { c, id } = await shop.claimedBy(localIso(wednesday, '15:00'));
    const url = (await pay(c, id)).body.checkoutUrl;
    t.payments.holdWebhooks();
    expect((await payOnHostedPage(url, FAKE_CARDS.succeeds)).status).toBe(303);
    const [charge] = chargesOf(id);
    t.payments.refundAtProvider(charge!.id);
    // Out of order: refund.created first, then checkout.session.completed.
    expect(await t.payments.releaseHeld('reverse')).toEqual([200, 200]);
    expect(await statusOf(id)).toBe('booked');
    expect(await moneyOf(id)).toEqual([
      { kind: 'deposit', status: 'succeeded', amount_cents: 2500, method: 'card' },
      { kind: 'refund', status: 'succeeded', amount_cents: 2500, method: 'card' },
    ]);
    expect(t.payments.refunds.filter((r) => r.payment_intent === charge!.id)).toHaveLength(1);
    const booking = await c.get(`/api/bookings/${id}`);
    expect(booking.body.deposit).toMatchObject({ status: 'refunded', paidCents: 0 });
  });
});

describe('card numbers', () => {
  it('never reach Dwell: not in any table of the database, not in the server log', async () => {
    const digits = [FAKE_CARDS.succeeds, FAKE_CARDS.declined, FAKE_CARDS.extraStep];
    const spaced = digits.map((d) => d.replace(/(\d{4})(?=\d)/g, '$1 '));
    expect(t.payments.charges().length).toBeGreaterThan(3); // this suite paid with them above
    const dump = spawnSync(join(findPostgresBin(), 'pg_dump'), ['--data-only', `--dbname=${t.testDb.url}`], { encoding: 'utf8', maxBuffer: 256 * 1024 * 1024 });
    expect(dump.status).toBe(0);
    expect(dump.stdout).toContain('checkout_sessions'); // the dump holds the payment tables
    const text = log.join('');
    for (const number of [...digits, ...spaced]) {
      expect(dump.stdout.includes(number), `${number} in the database`).toBe(false);
      expect(text.includes(number), `${number} in the log`).toBe(false);
    }
  });
});
