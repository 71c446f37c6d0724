import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { eventually, listenForPaymentWebhooks, payOnHostedPage } from '../setup/hosted-payment';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService } from '../factories/service';
import { insertSittingAround } from '../factories/day-of-service';
import { FAKE_CARDS } from '@server/fakes/payments-fake';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';

type Agent = Awaited<ReturnType<typeof signedInAgent>>;
let t: TestApp;
let webhooks: Awaited<ReturnType<typeof listenForPaymentWebhooks>>;
const db = () => t.testDb.db;

// A gloss: hands-on 30 minutes, then the basin, so a second stylist can take the rinse.
const plan: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Gloss', product: 'toner_direct', minutes: 30 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 15 },
      ],
    },
  ],
};

interface Shop {
  salon: SalonFixture;
  ana: UserFixture;
  lee: UserFixture;
  serviceId: string;
  desk$: Agent;
}

async function shop(settings: { currency: string; taxRateMilliPercent: number; taxInclusive: boolean }): Promise<Shop> {
  const salon = await insertSalon(db());
  await db()
    .updateTable('salons')
    .set({ currency: settings.currency, tax_rate_milli_percent: settings.taxRateMilliPercent, tax_inclusive: settings.taxInclusive })
    .where('id', '=', salon.salonId)
    .execute();
  const [ana, lee, desk] = await Promise.all([
    insertUser(db(), salon.salonId, 'stylist'),
    insertUser(db(), salon.salonId, 'stylist'),
    insertUser(db(), salon.salonId, 'front_desk'),
  ]);
  const serviceId = await insertPlannedService(db(), salon.salonId, { plan, name: 'Gloss refresh', category: 'treatment' });
  return { salon, ana, lee, serviceId, desk$: await signedInAgent(t.app, desk.email, desk.password) };
}

let product = 0;
async function addProduct(s: Shop, name: string, priceCents: number, stock: number): Promise<string> {
  const row = await db()
    .insertInto('retail_products')
    .values({ salon_id: s.salon.salonId, name: `${name} ${++product}`, price_cents: priceCents, stock })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

let minutesAgo = 600;
/**
 * A visit that has just ended: booked at 12000 minor units (the factory's price) for a new client with an e-mail,
 * the deposit taken in cash at the desk, Ana's hands-on step and (with `lee`) Lee at the basin, the sitting finished.
 */
async function endedVisit(s: Shop, o: { depositCents: number; lee?: boolean }) {
  const client = await insertUser(db(), s.salon.salonId, 'client');
  minutesAgo -= 60;
  const id = await insertSittingAround(db(), {
    salonId: s.salon.salonId,
    serviceId: s.serviceId,
    stylistId: s.ana.staffId!,
    clientId: client.clientId!,
    minutesAgo,
    depositCents: o.depositCents,
    plan,
  });
  if (o.depositCents > 0) expect((await s.desk$.write('post', `/api/bookings/${id}/deposit/taken`, { method: 'cash' })).status).toBe(200);
  if (o.lee) {
    const sitting = await db().selectFrom('sittings').select('id').where('booking_id', '=', id).executeTakeFirstOrThrow();
    await db().updateTable('booking_steps').set({ stylist_id: s.lee.staffId! }).where('sitting_id', '=', sitting.id).where('kind', '=', 'basin').execute();
  }
  await db().updateTable('sittings').set({ status: 'finished', arrived_at: new Date(), late_minutes: 0 }).where('booking_id', '=', id).execute();
  await db().updateTable('bookings').set({ status: 'finished' }).where('id', '=', id).execute();
  return { id, client };
}

const cashOnly = { method: 'cash' } as const;
/** Checks the visit out with its services as booked, no products and no discount: a tip and how it is paid. */
const checkOut = (s: Shop, id: string, tipCents: number, pay: object) =>
  s.desk$.write('post', `/api/bookings/${id}/checkout`, { services: [{}], retail: [], discount: null, tipCents, pay });
const moneyOf = (checkoutId: string) =>
  db()
    .selectFrom('payments')
    .select(['kind', 'method', 'amount_cents as cents', 'staff_id as staffId'])
    .where('checkout_id', '=', checkoutId)
    .orderBy('kind')
    .orderBy('amount_cents', 'desc')
    .execute();

let usd: Shop;
beforeAll(async () => {
  t = await startTestApp();
  webhooks = await listenForPaymentWebhooks(t);
  // 8.25 % added on top of the prices.
  usd = await shop({ currency: 'USD', taxRateMilliPercent: 8250, taxInclusive: false });
});
afterAll(async () => {
  await webhooks.close();
  await t.close();
});

describe('checkout at the desk: the arithmetic through the API', () => {
  it('USD, tax exclusive: lines, a discount spread, tax once, the deposit off, a tip split between the two stylists; paid in cash', async () => {
    const shampoo = await addProduct(usd, 'Bond shampoo', 2400, 5);
    const { id, client } = await endedVisit(usd, { depositCents: 3000, lee: true });
    const before = (await usd.desk$.get(`/api/bookings/${id}/checkout`)).body;
    expect(before).toMatchObject({
      ready: true,
      depositPaidCents: 3000,
      services: [{ label: 'Gloss refresh', priceCents: 12000, upToCents: null }],
      checkout: null,
    });
    expect(before.stylists.map((s: { id: string }) => s.id)).toEqual([usd.ana.staffId, usd.lee.staffId]);

    const res = await usd.desk$.write('post', `/api/bookings/${id}/checkout`, {
      services: [{}],
      retail: [{ productId: shampoo, quantity: 2 }],
      discount: { kind: 'amount', cents: 2000, reason: 'Waited 40 minutes' },
      tipCents: 1000,
      pay: cashOnly,
      // What a screen showed is ignored: every amount is the server's.
      shownToPayCents: 1,
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    // Worked by hand under docs/money.md's rules (USD has 2 decimals, ISO 4217): lines 120.00 + 2 × 24.00 = 168.00;
    // the 20.00 discount spread 14.2857… and 5.7142… → 14.28 and 5.71, the cent left to the larger remainder (the gloss);
    // tax 8.25 % of 148.00 = 12.21 exactly; total 160.21; less the 30.00 deposit 130.21; tip 10.00 as 5.00 + 5.00.
    const r = res.body.checkout.receipt;
    expect(r.lines.map((l: { discountCents: number; chargedCents: number }) => [l.discountCents, l.chargedCents])).toEqual([
      [1429, 10571],
      [571, 4229],
    ]);
    expect(r).toMatchObject({
      subtotalCents: 16800,
      discountCents: 2000,
      taxCents: 1221,
      totalCents: 16021,
      depositPaidCents: 3000,
      dueCents: 13021,
      tipCents: 1000,
      toPayCents: 14021,
    });
    expect(r.tipShares.map((s: { cents: number }) => s.cents)).toEqual([500, 500]);
    expect(res.body.checkout).toMatchObject({ status: 'paid', cashCents: 14021, cardCents: 0, checkoutUrl: null });
    expect(res.body.bookingStatus).toBe('checked_out');

    // The money: the balance in cash, one tip row per stylist.
    expect(await moneyOf(res.body.checkout.id)).toEqual([
      { kind: 'balance', method: 'cash', cents: 13021, staffId: null },
      { kind: 'tip', method: 'cash', cents: 500, staffId: expect.any(String) },
      { kind: 'tip', method: 'cash', cents: 500, staffId: expect.any(String) },
    ]);
    expect((await db().selectFrom('retail_products').select('stock').where('id', '=', shampoo).executeTakeFirstOrThrow()).stock).toBe(3);
    // Checked out on the booking page, the day view and the client card.
    expect((await usd.desk$.get(`/api/bookings/${id}`)).body.status).toBe('checked_out');
    const history = await db().selectFrom('audit_log').select('action').where('entity_id', '=', id).orderBy('id').execute();
    const actions = history.map((h) => h.action).join('\n');
    expect(actions).toMatch(/checkout: total \$160\.21, discount \$20\.00 \(Waited 40 minutes\), deposit applied \$30\.00, tip \$10\.00, to pay \$140\.21/);
    expect(actions).toMatch(/balance taken in cash: \$130\.21/);
    expect(actions).toMatch(/tip \$10\.00 by cash: .+ \$5\.00, .+ \$5\.00/);
    expect(actions).toMatch(/checked out: \$160\.21 total, paid by cash/);
    // The receipt by e-mail, through the send log.
    const mail = await eventually(async () => t.smtp.messages.find((m) => m.to === client.email && /receipt/i.test(m.subject)));
    expect(mail.text).toContain('Discount (Waited 40 minutes): −$20.00');
    expect(mail.text).toContain('Tax (8.25 %): $12.21');
    expect(mail.text).toContain('Deposit paid before: −$30.00');
    expect(mail.text).toContain('Paid today: $140.21');
    const logged = await db()
      .selectFrom('messages')
      .select(['kind', 'status'])
      .where('client_id', '=', client.clientId!)
      .where('kind', '=', 'receipt')
      .execute();
    expect(logged).toEqual([{ kind: 'receipt', status: 'sent' }]);
  });

  it('JPY (no minor unit), tax inclusive: a percentage discount rounds to whole yen, the tax is the part inside the prices', async () => {
    const jpy = await shop({ currency: 'JPY', taxRateMilliPercent: 10000, taxInclusive: true });
    const mask = await addProduct(jpy, 'Colour mask', 1650, 3);
    const { id } = await endedVisit(jpy, { depositCents: 3000 });
    const res = await jpy.desk$.write('post', `/api/bookings/${id}/checkout`, {
      services: [{}],
      retail: [{ productId: mask, quantity: 1 }],
      discount: { kind: 'percent', milliPercent: 5000, reason: 'Regular client' },
      tipCents: 1000,
      pay: cashOnly,
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    // ISO 4217: JPY has 0 decimals, so amounts are whole yen. Lines ¥12,000 + ¥1,650 = ¥13,650; 5 % = 682.5 → ¥683
    // (half up); spread 600.43… and 82.56… → 600 and 82, the yen left to the mask; ¥12,967 after the discount, the
    // tax inside it 12,967 × 10/110 = 1,178.8… → ¥1,179, net ¥11,788; less the ¥3,000 deposit ¥9,967; tip ¥1,000.
    expect(res.body.checkout.receipt).toMatchObject({
      currency: 'JPY',
      subtotalCents: 13650,
      discountCents: 683,
      taxInclusive: true,
      taxCents: 1179,
      netCents: 11788,
      totalCents: 12967,
      dueCents: 9967,
      toPayCents: 10967,
    });
    expect(res.body.checkout.receipt.lines.map((l: { chargedCents: number }) => l.chargedCents)).toEqual([11400, 1567]);
  });
});

describe('checkout at the desk: refusals and faults', () => {
  it('a second checkout of the same visit is 409; a visit not yet ended is 409; totals sent by the client are refused', async () => {
    const { id } = await endedVisit(usd, { depositCents: 0 });
    const body = { services: [{}], retail: [], discount: null, tipCents: 0, pay: cashOnly };
    expect((await usd.desk$.write('post', `/api/bookings/${id}/checkout`, { ...body, totalCents: 1 })).status).toBe(400);
    expect((await usd.desk$.write('post', `/api/bookings/${id}/checkout`, body)).status).toBe(201);
    const again = await usd.desk$.write('post', `/api/bookings/${id}/checkout`, body);
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/checked out already/);

    const client = await insertUser(db(), usd.salon.salonId, 'client');
    const ahead = await insertSittingAround(db(), {
      salonId: usd.salon.salonId,
      serviceId: usd.serviceId,
      stylistId: usd.ana.staffId!,
      clientId: client.clientId!,
      minutesAgo: -600,
      depositCents: 0,
      plan,
    });
    const early = await usd.desk$.write('post', `/api/bookings/${ahead}/checkout`, body);
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/not arrived/);
  });

  it('a total below the deposit, a discount larger than the lines, a negative tip: 400 naming the field, nothing stored', async () => {
    const { id } = await endedVisit(usd, { depositCents: 3000 });
    const base = { services: [{}], retail: [], discount: null, tipCents: 0, pay: cashOnly };
    const below = await usd.desk$.write('post', `/api/bookings/${id}/checkout`, { ...base, discount: { kind: 'amount', cents: 11000, reason: 'Redo' } });
    expect(below.status).toBe(400);
    expect(below.body.error.fields).toHaveProperty('depositPaidCents');
    const larger = await usd.desk$.write('post', `/api/bookings/${id}/checkout`, { ...base, discount: { kind: 'amount', cents: 12001, reason: 'Redo' } });
    expect(larger.status).toBe(400);
    expect(larger.body.error.fields).toHaveProperty(['discount.cents']);
    const negative = await usd.desk$.write('post', `/api/bookings/${id}/checkout`, { ...base, tipCents: -100 });
    expect(negative.status).toBe(400);
    expect(negative.body.error.fields).toHaveProperty('tipCents');
    expect(await db().selectFrom('checkouts').select('id').where('booking_id', '=', id).execute()).toEqual([]);
  });

  it('stock race: 10 concurrent checkouts for the last bottle, one wins, nine are 409 naming it, nothing else is kept', async () => {
    const last = await addProduct(usd, 'Purple shampoo', 1800, 1);
    const visits = [];
    for (let i = 0; i < 10; i++) visits.push(await endedVisit(usd, { depositCents: 0 }));
    const answers = await Promise.all(
      visits.map((v) =>
        usd.desk$.write('post', `/api/bookings/${v.id}/checkout`, {
          services: [{}],
          retail: [{ productId: last, quantity: 1 }],
          discount: null,
          tipCents: 0,
          pay: cashOnly,
        }),
      ),
    );
    expect(answers.map((a) => a.status).sort()).toEqual([201, ...Array(9).fill(409)]);
    for (const lost of answers.filter((a) => a.status === 409)) expect(lost.body.error.message).toMatch(/Purple shampoo \d+: only 0 left in stock/);
    expect((await db().selectFrom('retail_products').select('stock').where('id', '=', last).executeTakeFirstOrThrow()).stock).toBe(0);
    const stored = await db()
      .selectFrom('checkouts')
      .select('booking_id')
      .where(
        'booking_id',
        'in',
        visits.map((v) => v.id),
      )
      .execute();
    expect(stored).toHaveLength(1);
    const statuses = await db()
      .selectFrom('bookings')
      .select('status')
      .where(
        'id',
        'in',
        visits.map((v) => v.id),
      )
      .execute();
    expect(statuses.filter((s) => s.status === 'checked_out')).toHaveLength(1);
  });

  it('split: the cash part at once, the rest and the tip on the hosted page, confirmed by the signed webhook; a webhook twice changes nothing', async () => {
    const { id } = await endedVisit(usd, { depositCents: 3000, lee: true });
    const res = await checkOut(usd, id, 1001, { method: 'split', cashCents: 5000 });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    // 120.00 + 8.25 % (9.90) = 129.90, less 30.00 = 99.90 due; 50.00 in cash, 49.90 + the 10.01 tip on the card.
    expect(res.body.checkout).toMatchObject({ status: 'open', cashCents: 5000, cardCents: 5991 });
    expect(res.body.bookingStatus).toBe('finished');
    const session = [...t.payments.sessions.values()].find((s) => s.metadata.booking === id)!;
    expect(session).toMatchObject({ amount_total: 5991, currency: 'usd' });
    expect(res.body.checkout.checkoutUrl).toBe(session.url);

    const paid = await payOnHostedPage(res.body.checkout.checkoutUrl, FAKE_CARDS.succeeds);
    expect(paid.location).toMatch(new RegExp(`/desk/bookings/${id}/checkout\\?payment=done$`));
    await eventually(async () => (await usd.desk$.get(`/api/bookings/${id}/checkout`)).body.checkout.status === 'paid');
    const after = (await usd.desk$.get(`/api/bookings/${id}/checkout`)).body;
    expect(after.bookingStatus).toBe('checked_out');
    const rows = await moneyOf(after.checkout.id);
    expect(rows).toEqual([
      { kind: 'balance', method: 'cash', cents: 5000, staffId: null },
      { kind: 'balance', method: 'card', cents: 4990, staffId: null },
      { kind: 'tip', method: 'card', cents: 501, staffId: usd.ana.staffId },
      { kind: 'tip', method: 'card', cents: 500, staffId: usd.lee.staffId },
    ]);
    // The same event delivered again: a duplicate, nothing more recorded.
    const event = t.payments.events.find((e) => e.type === 'checkout.session.completed' && (e.data.object as { id: string }).id === session.id)!;
    expect(await t.payments.resend(event.id)).toBe(200);
    expect(await moneyOf(after.checkout.id)).toEqual(rows);
    expect(t.payments.charges().filter((p) => p.session === session.id)).toHaveLength(1);
  });

  it('card only: the webhook confirms the balance; when the card part is only the tip, its charge is the first stylist’s tip', async () => {
    const { id } = await endedVisit(usd, { depositCents: 0 });
    const res = await checkOut(usd, id, 0, { method: 'card' });
    expect(res.body.checkout).toMatchObject({ status: 'open', cardCents: 12990 });
    await payOnHostedPage(res.body.checkout.checkoutUrl, FAKE_CARDS.succeeds);
    await eventually(async () => (await usd.desk$.get(`/api/bookings/${id}/checkout`)).body.checkout.status === 'paid');
    expect(await moneyOf(res.body.checkout.id)).toEqual([{ kind: 'balance', method: 'card', cents: 12990, staffId: null }]);

    // 129.90 all paid as a deposit beforehand: what is left on the card is the tip.
    const tipOnly = await endedVisit(usd, { depositCents: 12990, lee: true });
    const split = await checkOut(usd, tipOnly.id, 600, { method: 'card' });
    expect(split.body.checkout).toMatchObject({ cardCents: 600 });
    await payOnHostedPage(split.body.checkout.checkoutUrl, FAKE_CARDS.succeeds);
    await eventually(async () => (await usd.desk$.get(`/api/bookings/${tipOnly.id}/checkout`)).body.checkout.status === 'paid');
    expect(await moneyOf(split.body.checkout.id)).toEqual([
      { kind: 'tip', method: 'card', cents: 300, staffId: expect.any(String) },
      { kind: 'tip', method: 'card', cents: 300, staffId: expect.any(String) },
    ]);
  });

  it('the card part taken in cash instead: the page closed at the provider, cash rows, checked out; after a card payment, 409; with the provider out of reach, a later card payment refunded', async () => {
    // A salon of its own, so its stylists' hands are free for the three visits this needs.
    const cash = await shop({ currency: 'USD', taxRateMilliPercent: 8250, taxInclusive: false });
    const { id } = await endedVisit(cash, { depositCents: 3000, lee: true });
    const res = await checkOut(cash, id, 1001, { method: 'split', cashCents: 5000 });
    expect(res.body.checkout).toMatchObject({ status: 'open', cashCents: 5000, cardCents: 5991 });
    const url = res.body.checkout.checkoutUrl as string;
    // The card is declined on the page; the client pays the rest in cash.
    await payOnHostedPage(url, FAKE_CARDS.declined);
    const taken = await cash.desk$.write('post', `/api/bookings/${id}/checkout/cash`);
    expect(taken.status, JSON.stringify(taken.body)).toBe(200);
    expect(taken.body.bookingStatus).toBe('checked_out');
    expect(taken.body.checkout).toMatchObject({ status: 'paid', checkoutUrl: null });
    // 99.90 due: 50.00 in cash at checkout, the other 49.90 now, and the 10.01 tip in cash, split 5.01 and 5.00.
    expect(await moneyOf(taken.body.checkout.id)).toEqual([
      { kind: 'balance', method: 'cash', cents: 5000, staffId: null },
      { kind: 'balance', method: 'cash', cents: 4990, staffId: null },
      { kind: 'tip', method: 'cash', cents: 501, staffId: cash.ana.staffId },
      { kind: 'tip', method: 'cash', cents: 500, staffId: cash.lee.staffId },
    ]);
    // The payment page is closed at the provider: nobody can pay it now, and no charge was made.
    const session = [...t.payments.sessions.values()].find((s) => s.metadata.booking === id)!;
    expect(session.status).toBe('expired');
    const late = await payOnHostedPage(url, FAKE_CARDS.succeeds);
    expect(late.html).toContain('This payment page has expired');
    expect(t.payments.charges().filter((p) => p.session === session.id)).toHaveLength(0);
    const history = await db().selectFrom('audit_log').select('action').where('entity_id', '=', id).execute();
    expect(history.map((h) => h.action)).toContain('the rest of the balance taken in cash instead of by card: $49.90');
    // Asked again: paid already.
    expect((await cash.desk$.write('post', `/api/bookings/${id}/checkout/cash`)).status).toBe(409);

    // A card part the client has just paid on the page: 409, and the card payment is what stands.
    const paidByCard = await endedVisit(cash, { depositCents: 0 });
    const open = await checkOut(cash, paidByCard.id, 0, { method: 'card' });
    await payOnHostedPage(open.body.checkout.checkoutUrl, FAKE_CARDS.succeeds);
    const tooLate = await cash.desk$.write('post', `/api/bookings/${paidByCard.id}/checkout/cash`);
    expect(tooLate.status).toBe(409);
    await eventually(async () => (await cash.desk$.get(`/api/bookings/${paidByCard.id}/checkout`)).body.checkout.status === 'paid');
    expect(await moneyOf(open.body.checkout.id)).toEqual([{ kind: 'balance', method: 'card', cents: 12990, staffId: null }]);
    // No checkout yet: nothing to take in cash.
    const notYet = await endedVisit(cash, { depositCents: 0 });
    expect((await cash.desk$.write('post', `/api/bookings/${notYet.id}/checkout/cash`)).status).toBe(409);

    // The payment service out of reach: the cash is taken all the same; the page it could not close is paid later,
    // and that payment, for a checkout already settled, is refunded in full.
    const unreachable = await endedVisit(cash, { depositCents: 0 });
    const card = await checkOut(cash, unreachable.id, 0, { method: 'card' });
    t.payments.failNext(6); // reading the page and closing it, each with the SDK's two retries
    const offline = await cash.desk$.write('post', `/api/bookings/${unreachable.id}/checkout/cash`);
    expect(offline.status, JSON.stringify(offline.body)).toBe(200);
    expect(offline.body.bookingStatus).toBe('checked_out');
    await payOnHostedPage(card.body.checkout.checkoutUrl, FAKE_CARDS.succeeds);
    const lateCharge = () => t.payments.charges().filter((p) => p.metadata.booking === unreachable.id);
    await eventually(async () => t.payments.refunds.filter((r) => lateCharge().some((c) => c.id === r.payment_intent)).length === 1);
    expect(lateCharge()).toHaveLength(1);
    expect(t.payments.refunds.filter((r) => r.payment_intent === lateCharge()[0]!.id)).toMatchObject([{ amount: 12990 }]);
  });

  it('the payment service refusing is a clear 503 PAYMENTS_UNAVAILABLE and nothing is half-written; a retry works', async () => {
    const bottle = await addProduct(usd, 'Gloss spray', 2000, 1);
    const { id } = await endedVisit(usd, { depositCents: 0 });
    const body = { services: [{}], retail: [{ productId: bottle, quantity: 1 }], discount: null, tipCents: 500, pay: { method: 'split', cashCents: 1000 } };
    t.payments.failNext(3); // the first try and the SDK's two retries
    const refused = await usd.desk$.write('post', `/api/bookings/${id}/checkout`, body);
    expect(refused.status).toBe(503);
    expect(refused.body.error.code).toBe('PAYMENTS_UNAVAILABLE');
    expect(await db().selectFrom('checkouts').select('id').where('booking_id', '=', id).execute()).toEqual([]);
    expect(await db().selectFrom('payments').select('id').where('booking_id', '=', id).execute()).toEqual([]);
    expect((await db().selectFrom('retail_products').select('stock').where('id', '=', bottle).executeTakeFirstOrThrow()).stock).toBe(1);
    const retried = await usd.desk$.write('post', `/api/bookings/${id}/checkout`, body);
    expect(retried.status).toBe(201);
    expect(retried.body.checkout.checkoutUrl).toMatch(/^http/);
  });

  it('the payment service answering slowly: the checkout waits for its page, and a second desk sending the same checkout meanwhile opens nothing more', async () => {
    const bottle = await addProduct(usd, 'Shine serum', 2500, 1);
    const { id } = await endedVisit(usd, { depositCents: 0 });
    const body = { services: [{}], retail: [{ productId: bottle, quantity: 1 }], discount: null, tipCents: 0, pay: { method: 'card' } };
    t.payments.slowNext(1, 1_500); // well inside the SDK's timeout, so no retry: one slow answer
    const [first, second] = await Promise.all([
      usd.desk$.write('post', `/api/bookings/${id}/checkout`, body),
      usd.desk$.write('post', `/api/bookings/${id}/checkout`, body),
    ]);
    expect([first.status, second.status].sort()).toEqual([201, 409]);
    const made = first.status === 201 ? first : second;
    expect(made.body.checkout.checkoutUrl).toMatch(/^http/);
    expect(await db().selectFrom('checkouts').select('id').where('booking_id', '=', id).execute()).toHaveLength(1);
    expect([...t.payments.sessions.values()].filter((s) => s.metadata.booking === id)).toHaveLength(1);
    expect((await db().selectFrom('retail_products').select('stock').where('id', '=', bottle).executeTakeFirstOrThrow()).stock).toBe(0);
  });
});
