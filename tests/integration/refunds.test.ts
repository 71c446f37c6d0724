import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { eventually, listenForPaymentWebhooks, payOnHostedPage } from '../setup/hosted-payment';
import { futureWeekday } from '../setup/dates';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser } from '../factories/user';
import { messageDesk } from '../factories/messages';
import { depositDesk, glossRefreshPlan } from '../factories/deposit-desk';
import { FAKE_CARDS } from '@server/fakes/payments-fake';

// Refunds at the desk and the deposit policy's money on cancelling, through the Stripe SDK against the payments fake.

let t: TestApp;
let salon: SalonFixture;
let serviceId: string;
let desk: Awaited<ReturnType<typeof messageDesk>>;
let owner: Awaited<ReturnType<typeof signedInAgent>>;
let webhooks: Awaited<ReturnType<typeof listenForPaymentWebhooks>>;
const plan = glossRefreshPlan;
// Three weeks ahead: outside any cancellation window, so a cancellation refunds the deposit.
const day = futureWeekday(4, 3);
const db = () => t.testDb.db;

beforeAll(async () => {
  t = await startTestApp();
  webhooks = await listenForPaymentWebhooks(t);
  ({ salon, serviceId, desk } = await depositDesk(t));
  const o = await insertUser(db(), salon.salonId, 'owner');
  owner = await signedInAgent(t.app, o.email, o.password);
});
afterAll(async () => {
  await webhooks.close();
  await t.close();
});

let hour = 9;
/** A desk booking whose $65.00 deposit the client paid online with 4242 on the hosted page. */
async function paidOnline() {
  const client = await desk.newClient();
  const id = await desk.book(serviceId, plan, day, `${String(hour++).padStart(2, '0')}:00`, client.clientId!);
  await desk.desk$.write('post', `/api/bookings/${id}/deposit/requests`, { channel: 'sms' });
  const text = await eventually(async () => desk.smsTo(client.phone).find((m) => m.body.includes('/deposit/')));
  const token = /\/deposit\/([A-Za-z0-9_-]{20,})/.exec(text.body)![1]!;
  const visitor = await anonymousAgent(t.app);
  const opened = await visitor.write('post', `/api/public/deposit-requests/${token}/pay`, {});
  await payOnHostedPage(opened.body.checkoutUrl, FAKE_CARDS.succeeds);
  await eventually(async () => (await desk.desk$.get(`/api/bookings/${id}/deposit`)).body.deposit.status === 'paid');
  const money = (await desk.desk$.get(`/api/bookings/${id}/payments`)).body;
  return { client, id, paymentId: money.payments[0].id as string, ref: (await paymentRow(money.payments[0].id)).provider_ref! };
}
const paymentRow = (id: string) => db().selectFrom('payments').selectAll().where('id', '=', id).executeTakeFirstOrThrow();
const refundsOf = (id: string) => db().selectFrom('payments').selectAll().where('refund_of', '=', id).where('status', 'in', ['pending', 'succeeded']).execute();
const atFake = (ref: string) => t.payments.refunds.filter((r) => r.payment_intent === ref);
const history = async (id: string) => ((await desk.desk$.get(`/api/bookings/${id}/history`)).body.entries as { action: string }[]).map((h) => h.action);

describe('refunds at the desk', () => {
  it('a partial refund of a card payment goes through the provider once, with its reason, in the history, and the client is told', async () => {
    const { client, id, paymentId, ref } = await paidOnline();
    const res = await desk.desk$.write('post', `/api/bookings/${id}/refunds`, { paymentId, amountCents: 2000, reason: 'Toner skipped' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.payments[0]).toMatchObject({ kind: 'deposit', method: 'card', online: true, amountCents: 6500, refundedCents: 2000, leftCents: 4500 });
    expect(res.body.refunds).toMatchObject([{ refundOf: paymentId, ofKind: 'deposit', method: 'card', amountCents: 2000, reason: 'Toner skipped' }]);
    // Made at the provider under its own key, exactly once, for exactly the amount.
    expect(atFake(ref).map((r) => r.amount)).toEqual([2000]);
    await eventually(async () => (await refundsOf(paymentId)).every((r) => r.status === 'succeeded' && r.provider_ref));
    expect(await history(id)).toContain('refunded $20.00 of the $65.00 deposit (card, online): Toner skipped');
    const told = await db().selectFrom('messages').select('body').where('client_id', '=', client.clientId!).where('kind', '=', 'payment_refunded').execute();
    expect(told.length).toBeGreaterThan(0);
    expect(told[0]!.body).toMatch(/refunded \$20\.00 of your deposit/);
    // The deposit now stands at what is left of it.
    expect((await desk.desk$.get(`/api/bookings/${id}/deposit`)).body.deposit).toMatchObject({ paidCents: 4500 });
  });

  it('a refund larger than what is left of the payment is refused with 400 naming the amounts, and nothing moves', async () => {
    const { id, paymentId, ref } = await paidOnline();
    await desk.desk$.write('post', `/api/bookings/${id}/refunds`, { paymentId, amountCents: 6000, reason: 'Most of it' });
    const res = await desk.desk$.write('post', `/api/bookings/${id}/refunds`, { paymentId, amountCents: 600, reason: 'Too much' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('A refund of $6.00 is more than the $5.00 left of this $65.00 payment.');
    expect(res.body.error.fields.amountCents).toMatch(/\$5\.00 left/);
    expect(atFake(ref).map((r) => r.amount)).toEqual([6000]);
    expect((await desk.desk$.write('post', `/api/bookings/${id}/refunds`, { paymentId, amountCents: 0, reason: 'x' })).status).toBe(400);
    expect((await desk.desk$.write('post', `/api/bookings/${id}/refunds`, { paymentId, amountCents: 100, reason: '' })).status).toBe(400);
  });

  it('10 partial refunds of one payment at the same moment never return more than it', async () => {
    const { id, paymentId, ref } = await paidOnline();
    const answers = await Promise.all(
      Array.from({ length: 10 }, (_, i) => desk.desk$.write('post', `/api/bookings/${id}/refunds`, { paymentId, amountCents: 1000, reason: `Part ${i + 1}` })),
    );
    const statuses = answers.map((a) => a.status).sort();
    // $65.00 holds six $10.00 refunds; the payment's lock queues them, so the other four find too little left.
    expect(statuses).toEqual([201, 201, 201, 201, 201, 201, 400, 400, 400, 400]);
    const rows = await refundsOf(paymentId);
    expect(rows.reduce((s, r) => s + r.amount_cents, 0)).toBe(6000);
    expect(atFake(ref).reduce((s, r) => s + r.amount, 0)).toBe(6000);
    expect(t.payments.payments.get(ref)!.amount_refunded).toBeLessThanOrEqual(6500);
  });

  it('a cash deposit goes back as cash, recorded at once; the owner may refund too; another salon gets 404', async () => {
    const client = await desk.newClient();
    const id = await desk.book(serviceId, plan, day, `${String(hour++).padStart(2, '0')}:00`, client.clientId!);
    await desk.desk$.write('post', `/api/bookings/${id}/deposit/taken`, { method: 'cash' });
    const paymentId = (await desk.desk$.get(`/api/bookings/${id}/payments`)).body.payments[0].id;
    const res = await owner.write('post', `/api/bookings/${id}/refunds`, { paymentId, amountCents: 6500, reason: 'Goodwill' });
    expect(res.status).toBe(201);
    expect(res.body.refunds).toMatchObject([{ method: 'cash', status: 'succeeded', amountCents: 6500 }]);
    expect(res.body.refunds[0].byName).toMatch(/owner/);
    expect(await history(id)).toContain('refunded $65.00 of the $65.00 deposit (cash): Goodwill');
    const other = await insertSalon(db());
    const stranger = await insertUser(db(), other.salonId, 'owner');
    const away = await signedInAgent(t.app, stranger.email, stranger.password);
    expect((await away.write('post', `/api/bookings/${id}/refunds`, { paymentId, amountCents: 1, reason: 'x' })).status).toBe(404);
  });
});

describe("the deposit policy's money", () => {
  it('cancelling outside the window refunds the deposit to the card once, even when cancelled twice at the same moment', async () => {
    const { id, paymentId, ref } = await paidOnline();
    const [a, b] = await Promise.all([
      desk.desk$.write('post', `/api/bookings/${id}/cancel`, { reason: 'Client moved away' }),
      desk.desk$.write('post', `/api/bookings/${id}/cancel`, { reason: 'Client moved away' }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const rows = await refundsOf(paymentId);
    expect(rows.map((r) => r.amount_cents)).toEqual([6500]);
    await eventually(async () => atFake(ref).length === 1);
    expect(atFake(ref).map((r) => r.amount)).toEqual([6500]);
    expect((await desk.desk$.get(`/api/bookings/${id}/deposit`)).body.deposit.status).toBe('refunded');
    expect(await history(id)).toContain(
      "deposit refunded to the card: $65.00 of the $65.00 deposit (card, online) (cancelled outside the salon's cancellation window)",
    );
  });

  it('cancelling inside the window keeps the deposit: no money moves and the history says so', async () => {
    await db().updateTable('salons').set({ cancellation_window_hours: 720 }).where('id', '=', salon.salonId).execute();
    try {
      const { id, paymentId, ref } = await paidOnline();
      expect((await desk.desk$.write('post', `/api/bookings/${id}/cancel`, { reason: 'Changed mind' })).status).toBe(200);
      expect(await refundsOf(paymentId)).toEqual([]);
      expect(atFake(ref)).toEqual([]);
      expect(await history(id)).toContain("deposit kept: $65.00 (cancelled inside the salon's cancellation window)");
    } finally {
      await db().updateTable('salons').set({ cancellation_window_hours: 48 }).where('id', '=', salon.salonId).execute();
    }
  });
});
