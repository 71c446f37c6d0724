import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertService } from '../factories/booking';
import { insertBooking } from '../../server/features/bookings/bookings.repository';
import type { Db } from '../../server/db/database';

let t: TestApp;
let salon: SalonFixture;
let stylist: UserFixture;
let client: UserFixture;
let earlier: string; // a finished booking of the same client, two weeks ago
let today: string; // sitting 1 under way now, sitting 2 in ten days
let stylist$: Awaited<ReturnType<typeof signedInAgent>>;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
// Whole hours keep the stylist's hands_on steps of different bookings apart (no overlap).
const base = Math.floor(Date.now() / HOUR) * HOUR;
const sitting = (chairId: string, startMs: number) => ({
  chairId,
  steps: [{ kind: 'hands_on' as const, label: 'Apply', product: 'none', start: new Date(startMs), end: new Date(startMs + HOUR), basinId: null }],
});

async function book(db: Db, serviceId: string, sittings: ReturnType<typeof sitting>[]) {
  return insertBooking(db, {
    salonId: salon.salonId, clientId: client.clientId!, serviceId, stylistId: stylist.staffId!, status: 'booked',
    stepPlan: { sittings: [{ steps: [{ kind: 'hands_on', label: 'Apply', product: 'none', minutes: 60 }] }] } as never, priceCents: 0, depositCents: 0, createdBy: null, sittings,
  });
}

const bowl = (over: object = {}) => ({
  sittingSeq: 1, bowlNo: 1, productType: 'lightener', shadeNotes: 'Powder, blue', developerPercent: 6, ratio: '1:2',
  grams: [{ part: 'lightener', grams: 30 }, { part: 'developer', grams: 60 }], appliedTo: 'Mid-lengths and ends',
  plannedMinutes: 40, actualMinutes: 35, heat: false, resultNotes: 'Lifted to level 8, even', ...over,
});

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db);
  stylist = await insertUser(db, salon.salonId, 'stylist');
  client = await insertUser(db, salon.salonId, 'client');
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  const serviceId = await insertService(db, salon.salonId);
  earlier = await book(db, serviceId, [sitting(salon.chairs[0], base - 14 * DAY)]);
  today = await book(db, serviceId, [sitting(salon.chairs[0], base - HOUR / 2), sitting(salon.chairs[0], base + 10 * DAY)]);
  stylist$ = await signedInAgent(t.app, stylist.email, stylist.password);
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
});
afterAll(() => t.close());

const write = (bookingId: string, body: object, who = stylist$) => who.write('post', `/api/bookings/${bookingId}/mix-logs`, body);

describe('writing a mix log', () => {
  it("lets the booking's stylist write a bowl of a started sitting (201), with the volume beside the percent", async () => {
    const res = await write(earlier, bowl());
    expect(res.status).toBe(201);
    // 6 % ÷ 0.30351 %/vol = 19.77 → 19.8 vol (definition factor, trade-facts §1).
    expect(res.body).toMatchObject({ sittingSeq: 1, bowlNo: 1, developerPercent: 6, developerVolume: 19.8, actualMinutes: 35 });
    const toner = bowl({ bowlNo: 2, productType: 'toner', developerPercent: 2.7, ratio: '1:1.5', grams: [{ part: 'toner', grams: 20 }, { part: 'developer', grams: 30 }] });
    expect((await write(earlier, toner, desk$)).status).toBe(201);
  });

  it('refuses a developer above the salon maximum of 12 %, naming developerPercent, and stores nothing', async () => {
    const res = await write(today, bowl({ developerPercent: 12.5 }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields.developerPercent).toMatch(/maximum of 12 %/);
    expect((await stylist$.get(`/api/bookings/${today}/mix-logs`)).body.logs).toHaveLength(0);
  });

  it('refuses a mix log for a sitting that has not started yet', async () => {
    const res = await write(today, bowl({ sittingSeq: 2 }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields.sittingSeq).toMatch(/not started/);
  });

  it('refuses negative grams and a ratio like "1:0", naming the fields', async () => {
    const neg = await write(today, bowl({ grams: [{ part: 'lightener', grams: -5 }] }));
    expect(neg.status).toBe(400);
    expect(Object.keys(neg.body.error.fields)).toContain('grams.0.grams');
    const ratio = await write(today, bowl({ ratio: '1:0' }));
    expect(ratio.status).toBe(400);
    expect(Object.keys(ratio.body.error.fields)).toEqual(['ratio']);
  });

  it("answers 404 to another salon's staff and 403 to a stylist who does not have the booking", async () => {
    const elsewhere = await insertSalon(t.testDb.db);
    const owner = await insertUser(t.testDb.db, elsewhere.salonId, 'owner');
    const owner$ = await signedInAgent(t.app, owner.email, owner.password);
    expect((await owner$.get(`/api/bookings/${earlier}/mix-logs`)).status).toBe(404);
    expect((await write(earlier, bowl({ bowlNo: 9 }), owner$)).status).toBe(404);
    const other = await insertUser(t.testDb.db, salon.salonId, 'stylist');
    const other$ = await signedInAgent(t.app, other.email, other.password);
    expect((await write(earlier, bowl({ bowlNo: 9 }), other$)).status).toBe(403);
  });
});

describe('repeat last time and totals', () => {
  it('copies the bowls of the earlier sitting into this sitting, without actual minutes or results', async () => {
    const res = await stylist$.write('post', `/api/bookings/${today}/mix-logs/repeat`, { fromBookingId: earlier, sitting: 1, intoSitting: 1 });
    expect(res.status).toBe(201);
    expect(res.body.copied).toBe(2);
    expect(res.body.logs.map((l: { bowlNo: number; productType: string }) => [l.bowlNo, l.productType])).toEqual([[1, 'lightener'], [2, 'toner']]);
    expect(res.body.logs[0]).toMatchObject({ developerPercent: 6, ratio: '1:2', plannedMinutes: 40, actualMinutes: null, resultNotes: '', shadeNotes: 'Powder, blue' });
    const future = await stylist$.write('post', `/api/bookings/${today}/mix-logs/repeat`, { fromBookingId: earlier, sitting: 1, intoSitting: 2 });
    expect(future.status).toBe(400);
    expect(future.body.error.fields.intoSitting).toBeDefined();
  });

  it('sums grams by product type per sitting in the list', async () => {
    const res = await desk$.get(`/api/bookings/${today}/mix-logs`);
    expect(res.status).toBe(200);
    expect(res.body.maxDeveloperPercent).toBe(12);
    expect(res.body.logs).toHaveLength(2);
    // Sitting 1: lightener 30 + 60 = 90 g; toner 20 + 30 = 50 g; 140 g in all. Sitting 2 has not started.
    expect(res.body.sittings).toEqual([
      expect.objectContaining({ seq: 1, started: true, totals: [{ productType: 'lightener', grams: 90 }, { productType: 'toner', grams: 50 }], totalGrams: 140 }),
      expect.objectContaining({ seq: 2, started: false, totals: [], totalGrams: 0 }),
    ]);
  });
});
