/**
 * The utilisation figures on a small book built by hand, every expected value worked out below with its
 * arithmetic; bad input; who may see what. The engine figures follow the definitions of the engine
 * contract (occupancy section); the rest follow docs/utilisation.md.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DateTime } from 'luxon';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService } from '../factories/service';
import { insertBooking, type NewStep } from '@server/features/bookings/bookings.repository';
import { writeAudit } from '@server/features/audit/audit.repository';
import type { BookingStatus } from '@shared/schemas/common.schemas';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';

let t: TestApp;
let salon: SalonFixture;
let a: UserFixture;
let b: UserFixture;
let owner$: Awaited<ReturnType<typeof signedInAgent>>;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
let stylist$: Awaited<ReturnType<typeof signedInAgent>>;
const services = { colour: '', cut: '', correction: '' };

// 2027-03-02 is a Tuesday, before the US change to daylight time (2027-03-14), so Denver is UTC−7.
const at = (date: string, hhmm: string) => DateTime.fromISO(`${date}T${hhmm}`, { zone: 'America/Denver' }).toJSDate();
const DAY = '2027-03-02';
type Step = [NewStep['kind'], string, string, number?];

const colourPlan: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Apply', product: 'none', minutes: 30 },
        { kind: 'developing', label: 'Develops', product: 'none', minMinutes: 45, maxMinutes: 60 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 15 },
      ],
    },
  ],
};
const cutPlan: StepPlan = { sittings: [{ steps: [{ kind: 'hands_on', label: 'Cut', product: 'none', minutes: 30 }] }] };
// Quoted: sitting 1 is 30 + 45..60 + 15 + 15 = 105..120 minutes, sitting 2 is 120: 225..240 in all.
const correctionPlan: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Apply', product: 'none', minutes: 30 },
        { kind: 'developing', label: 'Lifts', product: 'lightener', minMinutes: 45, maxMinutes: 60 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 15 },
        { kind: 'hands_on', label: 'Dry', product: 'none', minutes: 15 },
      ],
    },
    { daysAfterPrevious: { min: 1, max: 14 }, steps: [{ kind: 'hands_on', label: 'Colour and cut', product: 'none', minutes: 120 }] },
  ],
};

async function book(o: {
  stylist: UserFixture;
  service: string;
  plan: StepPlan;
  status: BookingStatus;
  price: number;
  deposit: number;
  sittings: Array<{ chair: number; date: string; steps: Step[] }>;
}): Promise<string> {
  const db = t.testDb.db;
  const client = await db
    .insertInto('clients')
    .values({ salon_id: salon.salonId, name: 'Hand-built client', email: null, phone: null })
    .returning('id')
    .executeTakeFirstOrThrow();
  return insertBooking(db, {
    salonId: salon.salonId,
    clientId: client.id,
    serviceId: o.service,
    stylistId: o.stylist.staffId!,
    status: o.status,
    stepPlan: o.plan,
    priceCents: o.price,
    depositCents: o.deposit,
    createdBy: null,
    sittings: o.sittings.map((s) => ({
      chairId: salon.chairs[s.chair]!,
      steps: s.steps.map(([kind, from, to, basin]) => ({
        kind,
        label: kind,
        start: at(s.date, from),
        end: at(s.date, to),
        basinId: basin === undefined ? null : salon.basins[basin]!,
      })),
    })),
  });
}

async function cancelled(id: string, outcome: 'kept' | 'refunded' | null, cancelledAt: Date) {
  await t.testDb.db.updateTable('bookings').set({ deposit_outcome: outcome }).where('id', '=', id).execute();
  await t.testDb.db.updateTable('audit_log').set({ at: cancelledAt }).where('entity_id', '=', id).execute();
}

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  // Open Tue–Sat 09:00–21:00 (720 minutes a day), 2 chairs, 1 basin.
  salon = await insertSalon(db, { chairs: 2, basins: 1 });
  a = await insertUser(db, salon.salonId, 'stylist', { hours: { rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '18:00' } });
  b = await insertUser(db, salon.salonId, 'stylist', { hours: { rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '12:00', end: '21:00' } });
  await db.updateTable('staff').set({ display_name: 'Ada' }).where('id', '=', a.staffId!).execute();
  await db.updateTable('staff').set({ display_name: 'Bo' }).where('id', '=', b.staffId!).execute();
  services.colour = await insertPlannedService(db, salon.salonId, { plan: colourPlan, name: 'Colour' });
  services.cut = await insertPlannedService(db, salon.salonId, { plan: cutPlan, name: 'Cut', category: 'cut', skill: 'colour' });
  services.correction = await insertPlannedService(db, salon.salonId, { plan: correctionPlan, name: 'Correction' });
  const ownerUser = await insertUser(db, salon.salonId, 'owner');
  const deskUser = await insertUser(db, salon.salonId, 'front_desk');
  owner$ = await signedInAgent(t.app, ownerUser.email, ownerUser.password);
  desk$ = await signedInAgent(t.app, deskUser.email, deskUser.password);
  stylist$ = await signedInAgent(t.app, a.email, a.password);

  // B1 Ada, chair 1, finished, $120 (deposit $30): hands 10:00–10:30, developing 10:30–11:30, basin 11:30–11:45.
  const b1 = await book({
    stylist: a,
    service: services.colour,
    plan: colourPlan,
    status: 'finished',
    price: 12000,
    deposit: 3000,
    sittings: [
      {
        chair: 0,
        date: DAY,
        steps: [
          ['hands_on', '10:00', '10:30'],
          ['developing', '10:30', '11:30'],
          ['basin', '11:30', '11:45', 0],
        ],
      },
    ],
  });
  // B2 Ada, chair 2, booked, $60: a cut 10:45–11:15, inside B1's developing time.
  const b2 = await book({
    stylist: a,
    service: services.cut,
    plan: cutPlan,
    status: 'booked',
    price: 6000,
    deposit: 0,
    sittings: [{ chair: 1, date: DAY, steps: [['hands_on', '10:45', '11:15']] }],
  });
  // B3 Bo, chair 2, no-show, $90 (deposit $20): 14:00–15:00 (the chair stays held in the book).
  const b3 = await book({
    stylist: b,
    service: services.cut,
    plan: cutPlan,
    status: 'no_show',
    price: 9000,
    deposit: 2000,
    sittings: [{ chair: 1, date: DAY, steps: [['hands_on', '14:00', '15:00']] }],
  });
  // B4 Ada, cancelled inside the 48-hour window, deposit $25 kept. B5 Bo, cancelled 3 days ahead, deposit $10 refunded.
  // B7 Ada, no deposit, cancelled at 08:00 the same morning: late. Cancelled bookings hold no chair.
  const b4 = await book({
    stylist: a,
    service: services.cut,
    plan: cutPlan,
    status: 'cancelled',
    price: 6000,
    deposit: 2500,
    sittings: [{ chair: 0, date: DAY, steps: [['hands_on', '16:00', '17:00']] }],
  });
  const b5 = await book({
    stylist: b,
    service: services.cut,
    plan: cutPlan,
    status: 'cancelled',
    price: 6000,
    deposit: 1000,
    sittings: [{ chair: 1, date: DAY, steps: [['hands_on', '19:00', '20:00']] }],
  });
  const b7 = await book({
    stylist: a,
    service: services.cut,
    plan: cutPlan,
    status: 'cancelled',
    price: 6000,
    deposit: 0,
    sittings: [{ chair: 1, date: DAY, steps: [['hands_on', '17:00', '17:30']] }],
  });
  for (const id of [b4, b5, b7])
    await writeAudit(db, { salonId: salon.salonId, actorUserId: null, entity: 'booking', entityId: id, action: 'cancelled: test' });
  await cancelled(b4, 'kept', at('2027-03-01', '18:00'));
  await cancelled(b5, 'refunded', at('2027-02-27', '10:00'));
  await cancelled(b7, null, at(DAY, '08:00'));
  // B8 Ada, chair 2, an unpaid online hold 09:00–09:30: a few minutes' keep while someone pays, not work, so it is in
  // none of the figures below (without it left out, chair occupancy would read 345 / 1440 and the 09:00 cell 30).
  const b8 = await book({
    stylist: a,
    service: services.cut,
    plan: cutPlan,
    status: 'held',
    price: 6000,
    deposit: 2500,
    sittings: [{ chair: 1, date: DAY, steps: [['hands_on', '09:00', '09:30']] }],
  });
  await db
    .updateTable('bookings')
    .set({ held_until: new Date(Date.now() + 600_000) })
    .where('id', '=', b8)
    .execute();
  // B6 Bo, a two-sitting correction, finished, $400 (deposit $100): sitting 1 today on chair 1 12:00–14:00
  // (hands 12:00–12:30, developing 12:30–13:30, basin 13:30–13:45, hands 13:45–14:00); sitting 2 a week later, 120 minutes.
  const b6 = await book({
    stylist: b,
    service: services.correction,
    plan: correctionPlan,
    status: 'finished',
    price: 40000,
    deposit: 10000,
    sittings: [
      {
        chair: 0,
        date: DAY,
        steps: [
          ['hands_on', '12:00', '12:30'],
          ['developing', '12:30', '13:30'],
          ['basin', '13:30', '13:45', 0],
          ['hands_on', '13:45', '14:00'],
        ],
      },
      { chair: 0, date: '2027-03-09', steps: [['hands_on', '10:00', '12:00']] },
    ],
  });

  // The money is what was paid (the payments rows), not the booking prices. On the day, 08:00: every deposit — B1 $30,
  // B3 $20, B4 $25, B5 $10, B6 $100 — and a $15 tip for Ada (the stylist's, never revenue). At the visits: B1's
  // balance $90, B2 $60. B5's $10 refunded when it was cancelled. B6's $300 balance at its second sitting on 9 March.
  const pay = (bookingId: string, kind: 'deposit' | 'balance' | 'tip' | 'refund', cents: number, when: Date, extra: { of?: string; staff?: string } = {}) =>
    db
      .insertInto('payments')
      .values({
        salon_id: salon.salonId,
        booking_id: bookingId,
        client_id: null,
        kind,
        method: 'card',
        amount_cents: cents,
        currency: 'USD',
        status: 'succeeded',
        provider_ref: null,
        refund_of: extra.of ?? null,
        staff_id: extra.staff ?? null,
        created_at: when,
      })
      .returning('id')
      .executeTakeFirstOrThrow();
  const morning = at(DAY, '08:00');
  for (const [id, cents] of [
    [b1, 3000],
    [b3, 2000],
    [b4, 2500],
    [b6, 10000],
  ] as const)
    await pay(id, 'deposit', cents, morning);
  const b5Deposit = await pay(b5, 'deposit', 1000, morning);
  await pay(b5, 'refund', 1000, at(DAY, '08:30'), { of: b5Deposit.id });
  await pay(b1, 'tip', 1500, at(DAY, '11:45'), { staff: a.staffId! });
  await pay(b1, 'balance', 9000, at(DAY, '11:45'));
  await pay(b2, 'balance', 6000, at(DAY, '11:15'));
  await pay(b6, 'balance', 30000, at('2027-03-09', '12:00'));
}, 60_000);
afterAll(() => t.close());

const oneDay = `period=custom&from=${DAY}&to=${DAY}`;

describe('utilisation figures on a hand-built day', () => {
  it('measures occupancy, hands-on share and window use as the engine contract defines them', async () => {
    const res = await owner$.get(`/api/owner/utilisation?${oneDay}`);
    expect(res.status).toBe(200);
    const r = res.body;
    expect(r.period).toEqual({ kind: 'custom', from: DAY, to: '2027-03-03', days: 1, scenarios: 1 });
    // Chairs held inside salon hours (live sittings only): B1 105 + B2 30 + B3 60 + B6 120 = 315 of 2 chairs × 720 open minutes.
    expect(r.chairOccupancy).toBe(315 / 1440);
    // Ada: hands 30 + 15 (B1) + 30 (B2) = 75 of 540 on the clock (09:00–18:00).
    // Bo: 60 (B3) + 30 + 15 + 15 (B6) = 120 of 540 (12:00–21:00).
    expect(r.handsOnShare).toEqual({ [a.staffId!]: 75 / 540, [b.staffId!]: 120 / 540 });
    // Window use: Ada is hands-on for B2 in 30 of B1's 60 developing minutes, leaving 30 free; Bo's 60
    // developing minutes in B6 stay free. 30 / (30 + 30 + 60) = 0.25.
    expect(r.windowUse).toBe(0.25);
  });

  it('works out money, deposits, attendance and corrections', async () => {
    const r = (await owner$.get(`/api/owner/utilisation?${oneDay}`)).body;
    // Revenue is the day's takings less refunds, tips left out: deposits $30 + $20 + $25 + $10 + $100 = $185, balances
    // $90 + $60 = $150, less B5's $10 refund → $325. Chair-hours: 2 chairs × 12 h = 24; stylist hours: 9 + 9 = 18.
    expect(r.money).toEqual({
      revenueCents: 32500,
      chairHours: 24,
      stylistHours: 18,
      revenuePerChairHourCents: 32500 / 24,
      revenuePerStylistHourCents: 32500 / 18,
    });
    // Deposits paid in the period: $30 + $20 + $25 + $10 + $100 = $185 in 5 payments;
    // kept: B3's $20 (no-show) + B4's $25 (late cancel) = $45; refunded: B5's $10.
    expect(r.deposits).toEqual({ takenCents: 18500, taken: 5, keptCents: 4500, kept: 2, refundedCents: 1000, refunded: 1 });
    // 7 bookings, 3 cancelled; no-shows 1 of the 4 not cancelled; late cancels B4 (kept) and B7 (9 h ahead) of 7.
    expect(r.attendance).toEqual({ bookings: 7, noShows: 1, noShowRate: 0.25, cancelled: 3, lateCancels: 2, lateCancelRate: 2 / 7 });
    // One correction: booked 120 + 120 = 240 minutes against a quote of 225..240.
    expect(r.corrections).toEqual({ count: 1, averageBookedMinutes: 240, averageQuotedMinMinutes: 225, averageQuotedMaxMinutes: 240 });
    // Chair time by service: Correction 120 (B6's $100 deposit), Colour 105 (B1's $30 + $90), Cut 30 (no-shows and
    // cancellations hold no chair time, but their money counts: B2 $60 + B3's kept $20 + B4's kept $25 + B5 $10 − $10 = $105).
    expect(r.topServices).toEqual([
      { serviceId: services.correction, name: 'Correction', chairMinutes: 120, sittings: 1, revenueCents: 10000 },
      { serviceId: services.colour, name: 'Colour', chairMinutes: 105, sittings: 1, revenueCents: 12000 },
      { serviceId: services.cut, name: 'Cut', chairMinutes: 30, sittings: 1, revenueCents: 10500 },
    ]);
    // Ada: B1, B2, B4, B7; revenue $120 + $60 + $25 = $205 over 9 h. Bo: B3, B5, B6; $20 + $0 + $100 = $120 over 9 h.
    expect(r.stylists).toEqual([
      {
        stylistId: a.staffId,
        name: 'Ada',
        handsOnShare: 75 / 540,
        handsOnMinutes: 75,
        onClockMinutes: 540,
        bookings: 4,
        noShows: 0,
        revenueCents: 20500,
        revenuePerHourCents: 20500 / 9,
      },
      {
        stylistId: b.staffId,
        name: 'Bo',
        handsOnShare: 120 / 540,
        handsOnMinutes: 120,
        onClockMinutes: 540,
        bookings: 3,
        noShows: 1,
        revenueCents: 12000,
        revenuePerHourCents: 12000 / 9,
      },
    ]);
  });

  it('fills the weekday × hour heat map and the weekly trend', async () => {
    const r = (await owner$.get(`/api/owner/utilisation?${oneDay}`)).body;
    // Twelve open hours on Tuesday (ISO weekday 2), 120 chair-minutes each.
    expect(r.heatMap).toHaveLength(12);
    const cell = (hour: number) => r.heatMap.find((c: { hour: number }) => c.hour === hour);
    // 10:00–11:00: chair 1 all 60 (B1) + chair 2 10:45–11:00 = 15 → 75 of 120.
    expect(cell(10)).toEqual({ weekday: 2, hour: 10, chairOccupancy: 75 / 120, chairHeldMinutes: 75, chairOpenMinutes: 120 });
    // 11:00–12:00: chair 1 11:00–11:45 = 45 + chair 2 11:00–11:15 = 15 → 60.
    expect(cell(11).chairHeldMinutes).toBe(60);
    expect(cell(9).chairOccupancy).toBe(0);
    expect(r.weeks).toEqual([
      { from: DAY, to: '2027-03-03', bookings: 7, chairOccupancy: 315 / 1440, windowUse: 0.25, handsOnShare: 195 / 1080, revenueCents: 32500 },
    ]);
  });

  it('counts a period of whole weeks in weekly rows that add up', async () => {
    const r = (await owner$.get('/api/owner/utilisation?period=month&date=2027-03-20')).body;
    expect(r.period).toMatchObject({ kind: 'month', from: '2027-03-01', to: '2027-04-01', days: 31 });
    // March 2027 starts on a Monday: weeks from the 1st, 8th, 15th, 22nd and 29th.
    expect(r.weeks.map((w: { from: string }) => w.from)).toEqual(['2027-03-01', '2027-03-08', '2027-03-15', '2027-03-22', '2027-03-29']);
    // B6's $300 balance, paid at its second sitting (9 March), now counts too: $325 + $300.
    expect(r.money.revenueCents).toBe(62500);
    expect(r.weeks[1].revenueCents).toBe(30000);
  });
});

describe('who sees what', () => {
  it('gives the desk occupancy, window use, attendance and chair time but no money or per-stylist figures', async () => {
    const res = await desk$.get(`/api/desk/utilisation?${oneDay}`);
    expect(res.status).toBe(200);
    expect(res.body.chairOccupancy).toBe(315 / 1440);
    expect(res.body.windowUse).toBe(0.25);
    expect(res.body.attendance.noShows).toBe(1);
    expect(res.body.topServices[0]).toEqual({ serviceId: services.correction, name: 'Correction', chairMinutes: 120, sittings: 1 });
    for (const key of ['money', 'deposits', 'stylists', 'handsOnShare', 'corrections']) expect(res.body).not.toHaveProperty(key);
    expect(res.body.weeks[0]).not.toHaveProperty('revenueCents');
  });

  it('refuses the owner routes to the desk and everything to stylists (403)', async () => {
    expect((await desk$.get(`/api/owner/utilisation?${oneDay}`)).status).toBe(403);
    expect((await desk$.get(`/api/owner/utilisation/scenario?${oneDay}`)).status).toBe(403);
    expect((await stylist$.get(`/api/desk/utilisation?${oneDay}`)).status).toBe(403);
    expect((await stylist$.get(`/api/owner/utilisation?${oneDay}`)).status).toBe(403);
  });
});

describe('bad input', () => {
  it.each([
    ['period=custom&from=2027-03-10&to=2027-03-01', 'to'],
    ['period=custom&from=2027-01-01&to=2029-01-01', 'to'],
    ['period=custom&from=2027-01-01', 'to'],
    ['period=custom&to=2027-01-01', 'from'],
    ['period=week&date=2027-02-30', 'date'],
    ['period=fortnight', 'period'],
    ['period=day&colour=red', ''],
  ])('%s → 400 naming "%s"', async (query, field) => {
    const res = await owner$.get(`/api/owner/utilisation?${query}`);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    if (field) expect(Object.keys(res.body.error.fields)).toContain(field);
  });

  it('takes a period of exactly two years (in several engine scenarios) but exports only one scenario', async () => {
    const long = 'period=custom&from=2027-01-01&to=2028-12-31';
    const res = await owner$.get(`/api/owner/utilisation?${long}`);
    expect(res.status).toBe(200);
    expect(res.body.period.days).toBe(731);
    expect(res.body.period.scenarios).toBeGreaterThan(1);
    // Summed over scenarios the same minutes give the same share: 315 chair-minutes on 2 March, 120 on 9 March.
    expect(res.body.money.revenueCents).toBe(62500);
    const exported = await owner$.get(`/api/owner/utilisation/scenario?${long}`);
    expect(exported.status).toBe(400);
    expect(exported.body.error.fields.to).toMatch(/120 days/);
  });
});
