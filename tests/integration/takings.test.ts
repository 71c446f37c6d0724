import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DateTime } from 'luxon';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { localIso } from '../setup/dates';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertService, insertTestBooking } from '../factories/booking';

// The day's takings from the payments rows of one salon day, and its close at the desk. Amounts in US cents
// (ISO 4217 USD, 2 decimals); the day is the salon's local day in America/Denver (IANA time-zone database).

let t: TestApp;
let salon: SalonFixture;
let ana: UserFixture;
let lee: UserFixture;
let deskUser: UserFixture;
let desk: Awaited<ReturnType<typeof signedInAgent>>;
let owner: Awaited<ReturnType<typeof signedInAgent>>;
const db = () => t.testDb.db;
// Two days ago in the salon: a day that has begun and ended.
const day = DateTime.now().setZone('America/Denver').minus({ days: 2 }).toISODate()!;
const at = (hhmm: string) => new Date(localIso(day, hhmm));

type Row = { kind: 'deposit' | 'balance' | 'tip' | 'refund'; method: 'card' | 'cash'; cents: number; at: Date; of?: string; staff?: string; status?: string };

beforeAll(async () => {
  t = await startTestApp();
  salon = await insertSalon(db());
  ana = await insertUser(db(), salon.salonId, 'stylist');
  lee = await insertUser(db(), salon.salonId, 'stylist');
  deskUser = await insertUser(db(), salon.salonId, 'front_desk');
  desk = await signedInAgent(t.app, deskUser.email, deskUser.password);
  const o = await insertUser(db(), salon.salonId, 'owner');
  owner = await signedInAgent(t.app, o.email, o.password);
});
afterAll(() => t.close());

async function visit(hhmm: string) {
  const client = await insertUser(db(), salon.salonId, 'client');
  const serviceId = await insertService(db(), salon.salonId);
  const end = DateTime.fromJSDate(at(hhmm)).plus({ minutes: 30 }).toISO()!;
  const bookingId = await insertTestBooking(db(), {
    salonId: salon.salonId,
    clientId: client.clientId!,
    stylistId: ana.staffId!,
    chairId: salon.chairs[0]!,
    serviceId,
    steps: [['hands_on', at(hhmm).toISOString(), end]],
  });
  return { bookingId, clientId: client.clientId! };
}

async function pay(v: { bookingId: string; clientId: string }, r: Row, checkoutId?: string): Promise<string> {
  const row = await db()
    .insertInto('payments')
    .values({
      salon_id: salon.salonId,
      booking_id: v.bookingId,
      client_id: v.clientId,
      kind: r.kind,
      method: r.method,
      amount_cents: r.cents,
      currency: 'USD',
      status: (r.status ?? 'succeeded') as 'succeeded',
      provider_ref: null,
      refund_of: r.of ?? null,
      staff_id: r.staff ?? null,
      checkout_id: checkoutId ?? null,
      created_at: r.at,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

describe("the day's takings", () => {
  it('adds up a worked example: by method, deposits taken, applied and refunded, balances, refunds, tips per stylist, cash expected', async () => {
    const a = await visit('09:00');
    const b = await visit('10:00');
    // Visit A: a $65.00 deposit paid online by card in the morning.
    await pay(a, { kind: 'deposit', method: 'card', cents: 6500, at: at('08:05') });
    // Visit B: a $40.00 deposit in cash, refunded in cash when B cancelled.
    const cashDeposit = await pay(b, { kind: 'deposit', method: 'cash', cents: 4000, at: at('09:10') });
    await pay(b, { kind: 'refund', method: 'cash', cents: 4000, at: at('11:00'), of: cashDeposit });
    // A's checkout: $200.00 less the $65.00 deposit plus a $30.00 tip = $165.00, paid $100.00 by card and $35.00 in
    // cash, the tip ($20.00 to Ana, $10.00 to Lee) on the card.
    const { id: checkoutId } = await db()
      .insertInto('checkouts')
      .values({
        salon_id: salon.salonId,
        booking_id: a.bookingId,
        currency: 'USD',
        receipt: '{}',
        subtotal_cents: 20000,
        total_cents: 20000,
        deposit_applied_cents: 6500,
        tip_cents: 3000,
        due_cents: 16500,
        status: 'paid',
        created_by: deskUser.id,
        paid_at: at('12:30'),
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    const cardBalance = await pay(a, { kind: 'balance', method: 'card', cents: 10000, at: at('12:30') }, checkoutId);
    await pay(a, { kind: 'balance', method: 'cash', cents: 3500, at: at('12:30') }, checkoutId);
    await pay(a, { kind: 'tip', method: 'card', cents: 2000, at: at('12:30'), staff: ana.staffId! }, checkoutId);
    await pay(a, { kind: 'tip', method: 'card', cents: 1000, at: at('12:30'), staff: lee.staffId! }, checkoutId);
    // $15.00 of the card balance refunded in the afternoon.
    await pay(a, { kind: 'refund', method: 'card', cents: 1500, at: at('15:00'), of: cardBalance });
    // Not this day's: the evening before, a declined card, the morning after.
    await pay(a, { kind: 'deposit', method: 'cash', cents: 999, at: new Date(at('00:00').getTime() - 60_000) });
    await pay(a, { kind: 'balance', method: 'card', cents: 777, at: at('13:00'), status: 'declined' });
    await pay(a, { kind: 'balance', method: 'cash', cents: 555, at: new Date(at('00:00').getTime() + 24 * 3_600_000) });

    const res = await desk.get(`/api/desk/takings?date=${day}`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const k = res.body;
    expect(k.currency).toBe('USD');
    // Card: 6500 + 10000 + 2000 + 1000 = 19500 in, 1500 back. Cash: 4000 + 3500 = 7500 in, 4000 back.
    expect(k.byMethod).toEqual({
      card: { inCents: 19500, refundedCents: 1500, netCents: 18000 },
      cash: { inCents: 7500, refundedCents: 4000, netCents: 3500 },
    });
    expect(k.deposits).toEqual({ takenCents: 10500, appliedCents: 6500, refundedCents: 4000 });
    expect(k.balancesCents).toBe(13500);
    expect(k.refundsCents).toBe(5500);
    expect(k.tipsCents).toBe(3000);
    expect(k.tipsByStylist.map((s: { stylistId: string; tipsCents: number }) => [s.stylistId, s.tipsCents]).sort()).toEqual(
      [
        [ana.staffId, 2000],
        [lee.staffId, 1000],
      ].sort(),
    );
    expect(k.expectedCashCents).toBe(3500);
    expect(k.movements).toHaveLength(8);
    expect(k.close).toBeNull();
  });

  it('closes the day once with the cash counted and the difference; a second close is 409 until the owner reopens it', async () => {
    // $34.20 counted against $35.00 expected: $0.80 short.
    const closed = await desk.write('post', '/api/desk/takings/close', { date: day, countedCashCents: 3420, note: 'Float left at $100' });
    expect(closed.status, JSON.stringify(closed.body)).toBe(201);
    expect(closed.body.close).toMatchObject({
      expectedCashCents: 3500,
      countedCashCents: 3420,
      differenceCents: -80,
      note: 'Float left at $100',
      reopenedAt: null,
    });
    expect(closed.body.close.closedBy).toMatch(/front_desk/);
    const again = await desk.write('post', '/api/desk/takings/close', { date: day, countedCashCents: 3500 });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/closed already/);
    // Two closes at the same moment on another day: the unique index lets one in.
    const before = DateTime.fromISO(day).minus({ days: 1 }).toISODate()!;
    const both = await Promise.all([0, 1].map(() => desk.write('post', '/api/desk/takings/close', { date: before, countedCashCents: 0 })));
    expect(both.map((r) => r.status).sort()).toEqual([201, 409]);

    expect((await desk.write('post', '/api/desk/takings/reopen', { date: day })).status).toBe(403);
    const reopened = await owner.write('post', '/api/desk/takings/reopen', { date: day });
    expect(reopened.status).toBe(200);
    expect(reopened.body.close).toBeNull();
    expect(reopened.body.reopened).toHaveLength(1);
    const recount = await desk.write('post', '/api/desk/takings/close', { date: day, countedCashCents: 3500 });
    expect(recount.status).toBe(201);
    expect(recount.body.close.differenceCents).toBe(0);
    expect(recount.body.reopened[0]).toMatchObject({ countedCashCents: 3420, differenceCents: -80 });
    expect(recount.body.reopened[0].reopenedBy).toMatch(/owner/);
  });

  it('refuses a day not begun and a day not closed to reopen', async () => {
    const tomorrow = DateTime.now().setZone('America/Denver').plus({ days: 1 }).toISODate()!;
    expect((await desk.write('post', '/api/desk/takings/close', { date: tomorrow, countedCashCents: 0 })).status).toBe(409);
    expect((await owner.write('post', '/api/desk/takings/reopen', { date: tomorrow })).status).toBe(409);
    expect((await desk.write('post', '/api/desk/takings/close', { date: day, countedCashCents: -1 })).status).toBe(400);
  });
});
