import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { eventually, listenForPaymentWebhooks, payOnHostedPage } from '../setup/hosted-payment';
import { futureWeekday, localIso } from '../setup/dates';
import { setupPaths } from '../setup/setup-paths';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser } from '../factories/user';
import { insertPlannedService } from '../factories/service';
import { insertTestBooking } from '../factories/booking';
import { messageDesk } from '../factories/messages';
import { depositDesk, glossRefreshPlan } from '../factories/deposit-desk';
import { FAKE_CARDS } from '@server/fakes/payments-fake';
import { releaseUnpaidDeposits } from '@server/features/payments';
import { sha256 } from '@server/lib/hash';

let t: TestApp;
let salon: SalonFixture;
let serviceId: string;
let desk: Awaited<ReturnType<typeof messageDesk>>;
let webhooks: Awaited<ReturnType<typeof listenForPaymentWebhooks>>;
const plan = glossRefreshPlan;
const day = futureWeekday(4, 3);
const db = () => t.testDb.db;

beforeAll(async () => {
  t = await startTestApp();
  webhooks = await listenForPaymentWebhooks(t);
  ({ salon, serviceId, desk } = await depositDesk(t));
});
afterAll(async () => {
  await webhooks.close();
  await t.close();
});

let hour = 9;
/** A desk booking of the gloss for a new client reachable by SMS and e-mail, an hour later each time. */
async function deskBooking() {
  const client = await desk.newClient();
  const id = await desk.book(serviceId, plan, day, `${String(hour++).padStart(2, '0')}:00`, client.clientId!);
  return { client, id };
}
const deposit = async (id: string) => (await desk.desk$.get(`/api/bookings/${id}/deposit`)).body;
const linkIn = (text: string) => /\/deposit\/([A-Za-z0-9_-]{20,})/.exec(text)?.[1];

describe('deposits of desk bookings', () => {
  it('show as due on the day view, the booking page and the client card', async () => {
    const { client, id } = await deskBooking();
    const due = { status: 'due', paidCents: 0, dueCents: 6500, dueBy: null };
    expect((await desk.desk$.get(`/api/bookings/${id}`)).body.deposit).toEqual(due);
    const book = (await desk.desk$.get(`/api/desk/day?date=${day}`)).body;
    expect(book.currency).toBe('USD');
    expect(book.bookings.find((b: { id: string }) => b.id === id).deposit).toEqual(due);
    expect((await desk.desk$.get(`/api/clients/${client.clientId}`)).body.bookings.find((b: { id: string }) => b.id === id).deposit).toEqual(due);
    expect(await deposit(id)).toMatchObject({
      depositCents: 6500,
      currency: 'USD',
      deposit: due,
      movements: [],
      requests: [],
      reach: { sms: true, email: true },
    });
  });

  it("a request by SMS sends a link that opens the payment service's page for the amount due; paid there, the deposit is paid", async () => {
    const { client, id } = await deskBooking();
    const sent = await desk.desk$.write('post', `/api/bookings/${id}/deposit/requests`, { channel: 'sms' });
    expect(sent.status).toBe(201);
    expect(sent.body.requests).toMatchObject([{ channel: 'sms', amountCents: 6500 }]);
    const text = await eventually(async () => desk.smsTo(client.phone).find((m) => m.body.includes('/deposit/')));
    expect(text.body).toContain('$65.00');
    const token = linkIn(text.body)!;
    const visitor = await anonymousAgent(t.app);
    expect((await visitor.get(`/api/public/deposit-requests/${token}`)).body).toMatchObject({
      serviceName: 'Gloss refresh',
      open: true,
      depositCents: 6500,
      deposit: { status: 'due', dueCents: 6500 },
    });
    const opened = await visitor.write('post', `/api/public/deposit-requests/${token}/pay`, {});
    expect(opened.status).toBe(200);
    const session = [...t.payments.sessions.values()].find((s) => s.metadata.booking === id)!;
    expect(session).toMatchObject({ amount_total: 6500, currency: 'usd' });
    const paid = await payOnHostedPage(opened.body.checkoutUrl, FAKE_CARDS.succeeds);
    expect(paid.location).toMatch(new RegExp(`/deposit/${token}\\?payment=done$`));
    await eventually(async () => (await deposit(id)).deposit.status === 'paid');
    expect((await deposit(id)).movements).toMatchObject([
      { kind: 'deposit', method: 'card', online: true, amountCents: 6500, status: 'succeeded', byName: null },
    ]);
    expect((await visitor.get(`/api/public/deposit-requests/${token}`)).body.deposit).toMatchObject({ status: 'paid', dueCents: 0 });
    expect((await visitor.write('post', `/api/public/deposit-requests/${token}/pay`, {})).status).toBe(409);
  });

  it('taken at the desk records who and when; an open payment page is closed, and a payment still made through one is refunded', async () => {
    const { client, id } = await deskBooking();
    expect((await desk.desk$.write('post', `/api/bookings/${id}/deposit/requests`, { channel: 'email' })).status).toBe(201);
    const mail = await eventually(async () => t.smtp.messages.find((m) => m.to === client.email && m.text.includes('/deposit/')));
    const visitor = await anonymousAgent(t.app);
    const url = (await visitor.write('post', `/api/public/deposit-requests/${linkIn(mail.text)}/pay`, {})).body.checkoutUrl;
    // The client pays online while the desk takes cash; the provider's confirmation comes after.
    t.payments.holdWebhooks();
    expect((await payOnHostedPage(url, FAKE_CARDS.succeeds)).status).toBe(303);
    const taken = await desk.desk$.write('post', `/api/bookings/${id}/deposit/taken`, { method: 'cash', note: 'Receipt 12' });
    expect(taken.status).toBe(200);
    expect(taken.body.deposit).toMatchObject({ status: 'paid', dueCents: 0, paidCents: 6500 });
    expect(taken.body.movements).toMatchObject([{ kind: 'deposit', method: 'cash', online: false, amountCents: 6500, note: 'Receipt 12' }]);
    expect(taken.body.movements[0].byName).toMatch(/front_desk/);
    expect(Date.now() - Date.parse(taken.body.movements[0].at)).toBeLessThan(60_000);
    expect(await t.payments.releaseHeld()).toEqual([200]);
    const after = await deposit(id);
    // In the order the salon learnt of them: the cash, the card payment when its confirmation came, its refund.
    expect(after.movements.map((m: { kind: string; method: string; status: string }) => `${m.kind} ${m.method} ${m.status}`)).toEqual([
      'deposit cash succeeded',
      'deposit card succeeded',
      'refund card succeeded',
    ]);
    expect(after.deposit).toMatchObject({ status: 'paid', paidCents: 6500 });
    expect(t.payments.refunds.filter((r) => r.metadata.dwell_refund)).toHaveLength(1);
    const told = await db().selectFrom('messages').select('body').where('client_id', '=', client.clientId!).where('kind', '=', 'payment_refunded').execute();
    expect(told[0]!.body).toMatch(/deposit was already paid/);

    // A page opened and not paid yet is closed at the provider when the deposit is taken on the card terminal.
    const other = await deskBooking();
    await desk.desk$.write('post', `/api/bookings/${other.id}/deposit/requests`, { channel: 'sms' });
    const text = await eventually(async () => desk.smsTo(other.client.phone).find((m) => m.body.includes('/deposit/')));
    const open = (await visitor.write('post', `/api/public/deposit-requests/${linkIn(text.body)}/pay`, {})).body.checkoutUrl;
    expect((await desk.desk$.write('post', `/api/bookings/${other.id}/deposit/taken`, { method: 'card' })).body.movements[0]).toMatchObject({
      method: 'card',
      online: false,
    });
    expect((await fetch(open)).status).toBe(410);
  });

  it('refuses what makes no sense: nothing due, no way to reach the client, a cancelled booking', async () => {
    const { id } = await deskBooking();
    await desk.desk$.write('post', `/api/bookings/${id}/deposit/taken`, { method: 'cash' });
    expect((await desk.desk$.write('post', `/api/bookings/${id}/deposit/taken`, { method: 'cash' })).status).toBe(409);
    expect((await desk.desk$.write('post', `/api/bookings/${id}/deposit/requests`, { channel: 'sms' })).body.error.message).toMatch(/paid already/);
    const quiet = await deskBooking();
    await db().updateTable('clients').set({ phone: null }).where('id', '=', quiet.client.clientId!).execute();
    expect((await desk.desk$.write('post', `/api/bookings/${quiet.id}/deposit/requests`, { channel: 'sms' })).body.error.message).toMatch(/no mobile/);
    expect((await deposit(quiet.id)).reach).toEqual({ sms: false, email: true });
    await desk.desk$.write('post', `/api/bookings/${quiet.id}/cancel`, { reason: 'Client asked' });
    expect((await desk.desk$.write('post', `/api/bookings/${quiet.id}/deposit/taken`, { method: 'cash' })).body.error.code).toBe('NOT_BOOKABLE');
    expect((await desk.desk$.write('post', `/api/bookings/${quiet.id}/deposit/taken`, { method: 'cheque' })).status).toBe(400);
  });
});

describe('a salon that releases unpaid desk bookings', () => {
  it('fixes the time on each booking as it is made; the job cancels the unpaid ones then, and keeps the paid ones', async () => {
    // Quiet hours of a minute (the set-up form refuses none at all, which the suite uses to send at once).
    await db().updateTable('salons').set({ quiet_from: '03:00', quiet_to: '03:01' }).where('id', '=', salon.salonId).execute();
    const owner = await insertUser(db(), salon.salonId, 'owner');
    const owner$ = await signedInAgent(t.app, owner.email, owner.password);
    const settings = (await owner$.get(setupPaths.salon)).body;
    expect(settings.unpaidDepositReleaseHours).toBeNull();
    expect((await owner$.write('put', setupPaths.salon, { ...settings, unpaidDepositReleaseHours: 24 })).status).toBe(200);
    try {
      const before = Date.now();
      const unpaid = await deskBooking();
      const paid = await deskBooking();
      const dueBy = Date.parse((await desk.desk$.get(`/api/bookings/${unpaid.id}`)).body.deposit.dueBy);
      expect(dueBy - before).toBeGreaterThanOrEqual(24 * 3_600_000);
      expect(dueBy - Date.now()).toBeLessThanOrEqual(24 * 3_600_000);
      await desk.desk$.write('post', `/api/bookings/${paid.id}/deposit/taken`, { method: 'cash' });
      // A day later: both are past their time.
      expect(await releaseUnpaidDeposits(db(), new Date(Date.now() + 25 * 3_600_000))).toBe(1);
      const released = (await desk.desk$.get(`/api/bookings/${unpaid.id}`)).body;
      expect(released).toMatchObject({ status: 'cancelled', depositOutcome: null, deposit: { status: 'none' } });
      expect(released.cancelReason).toMatch(/^Released: the deposit was not paid by /);
      expect((await desk.desk$.get(`/api/bookings/${paid.id}`)).body.status).toBe('booked');
      expect(await desk.planned(unpaid.id, 'cancellation')).not.toEqual([]);
      // Released after 30 days (720 hours), a booking three weeks ahead would be released after its sitting: none is set.
      expect((await owner$.write('put', setupPaths.salon, { ...settings, unpaidDepositReleaseHours: 720 })).status).toBe(200);
      const near = await deskBooking();
      expect((await desk.desk$.get(`/api/bookings/${near.id}`)).body.deposit).toMatchObject({ status: 'due', dueBy: null });
    } finally {
      expect((await owner$.write('put', setupPaths.salon, { ...settings, unpaidDepositReleaseHours: null })).status).toBe(200);
    }
  });
});

describe('deposits in other currencies', () => {
  it("ask the provider for the minor units ISO 4217 gives: JPY has none, KWD three decimals; the page shows the currency's own amount", async () => {
    // ISO 4217: JPY has exponent 0 (¥5,000 is 5000 minor units); KWD has exponent 3 (KWD 2.500 is 2500 fils).
    for (const [currency, minor, page] of [
      ['JPY', 5000, '¥5,000'],
      ['KWD', 2500, 'KWD 2.500'],
    ] as const) {
      const there = await insertSalon(db());
      await db().updateTable('salons').set({ currency }).where('id', '=', there.salonId).execute();
      const stylist = await insertUser(db(), there.salonId, 'stylist');
      const client = await insertUser(db(), there.salonId, 'client');
      const id = await insertTestBooking(db(), {
        salonId: there.salonId,
        clientId: client.clientId!,
        stylistId: stylist.staffId!,
        chairId: there.chairs[0]!,
        serviceId: await insertPlannedService(db(), there.salonId, { plan }),
        steps: [['hands_on', localIso(day, '10:00'), localIso(day, '10:30')]],
      });
      await db().updateTable('bookings').set({ deposit_cents: minor }).where('id', '=', id).execute();
      const token = `currency-token-${currency}-${Date.now()}`;
      await db()
        .insertInto('deposit_requests')
        .values({ salon_id: there.salonId, booking_id: id, token_hash: sha256(token), channel: 'sms', amount_cents: minor, requested_by: null })
        .execute();
      const visitor = await anonymousAgent(t.app);
      const url = (await visitor.write('post', `/api/public/deposit-requests/${token}/pay`, {})).body.checkoutUrl;
      const session = [...t.payments.sessions.values()].find((s) => s.metadata.booking === id)!;
      expect(session).toMatchObject({ amount_total: minor, currency: currency.toLowerCase() });
      expect(await (await fetch(url)).text()).toContain(page);
      expect((await payOnHostedPage(url, FAKE_CARDS.succeeds)).status).toBe(303);
      await eventually(
        async () => (await db().selectFrom('payments').select('amount_cents').where('booking_id', '=', id).executeTakeFirst())?.amount_cents === minor,
      );
    }
  });
});
