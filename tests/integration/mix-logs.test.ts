import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertService } from '../factories/booking';
import { insertBooking } from '@server/features/bookings/bookings.repository';
import type { Db } from '@server/db/database';
import type { BookingStatus } from '@shared/schemas/common.schemas';
import { down as removePartKinds, up as addPartKinds } from '../../migrations/20261205T0100_add_mix_part_kinds';

let t: TestApp;
let salon: SalonFixture;
let stylist: UserFixture;
let client: UserFixture;
let serviceId: string;
let earlier: string; // a finished booking of the same client, two weeks ago
let today: string; // sitting 1 under way now, sitting 2 in ten days
let ahead: string; // booked, its one sitting in three days
let cancelled: string; // cancelled, its one sitting in five days
let othersBooking: string; // the same client's booking with another stylist, a week ago
let stylist$: Awaited<ReturnType<typeof signedInAgent>>;
let other$: Awaited<ReturnType<typeof signedInAgent>>;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
let owner$: Awaited<ReturnType<typeof signedInAgent>>;

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
// Whole hours keep the stylist's hands_on steps of different bookings apart (no overlap).
const base = Math.floor(Date.now() / HOUR) * HOUR;
const sitting = (chairId: string, startMs: number) => ({
  chairId,
  steps: [{ kind: 'hands_on' as const, label: 'Apply', product: 'none', start: new Date(startMs), end: new Date(startMs + HOUR), basinId: null }],
});

async function book(db: Db, sittings: ReturnType<typeof sitting>[], status: BookingStatus = 'booked', stylistId = stylist.staffId!) {
  return insertBooking(db, {
    salonId: salon.salonId,
    clientId: client.clientId!,
    serviceId,
    stylistId,
    status,
    stepPlan: { sittings: [{ steps: [{ kind: 'hands_on', label: 'Apply', product: 'none', minutes: 60 }] }] } as never,
    priceCents: 0,
    depositCents: 0,
    createdBy: null,
    sittings,
  });
}

const bowl = (over: object = {}) => ({
  sittingSeq: 1,
  bowlNo: 1,
  productType: 'lightener',
  shadeNotes: 'Powder, blue',
  developerPercent: 6,
  ratio: '1:2',
  grams: [
    { kind: 'lightener', part: 'blue powder', grams: 30 },
    { kind: 'developer', part: '', grams: 60 },
  ],
  appliedTo: 'Mid-lengths and ends',
  plannedMinutes: 40,
  actualMinutes: 35,
  heat: false,
  resultNotes: 'Lifted to level 8, even',
  ...over,
});

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db);
  stylist = await insertUser(db, salon.salonId, 'stylist');
  const other = await insertUser(db, salon.salonId, 'stylist');
  client = await insertUser(db, salon.salonId, 'client');
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  const owner = await insertUser(db, salon.salonId, 'owner');
  serviceId = await insertService(db, salon.salonId);
  earlier = await book(db, [sitting(salon.chairs[0]!, base - 14 * DAY)], 'finished');
  today = await book(db, [sitting(salon.chairs[0]!, base - HOUR / 2), sitting(salon.chairs[0]!, base + 10 * DAY)]);
  ahead = await book(db, [sitting(salon.chairs[0]!, base + 3 * DAY)]);
  cancelled = await book(db, [sitting(salon.chairs[0]!, base + 5 * DAY)], 'cancelled');
  othersBooking = await book(db, [sitting(salon.chairs[1]!, base - 7 * DAY)], 'finished', other.staffId!);
  stylist$ = await signedInAgent(t.app, stylist.email, stylist.password);
  other$ = await signedInAgent(t.app, other.email, other.password);
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
  owner$ = await signedInAgent(t.app, owner.email, owner.password);
});
afterAll(() => t.close());

const write = (bookingId: string, body: object, who = stylist$) => who.write('post', `/api/bookings/${bookingId}/mix-logs`, body);
const repeat = (bookingId: string, body: object, who = stylist$) => who.write('post', `/api/bookings/${bookingId}/mix-logs/repeat`, body);
const list = (bookingId: string, who = stylist$) => who.get(`/api/bookings/${bookingId}/mix-logs`);

describe('writing a mix log', () => {
  it("lets the booking's stylist write a bowl (201), each part kept as what it is, with the trade volume beside the percent", async () => {
    const res = await write(earlier, bowl());
    expect(res.status).toBe(201);
    // 6 % ÷ 0.3 % per volume = 20 vol: bottles are labelled 3/6/9/12 % = 10/20/30/40 vol (common practice;
    // the EU regulation writes its limit "12 % of H2O2 (40 volumes)", Reg. (EC) 1223/2009 Annex III entry 12).
    expect(res.body).toMatchObject({ sittingSeq: 1, bowlNo: 1, developerPercent: 6, developerVolume: 20, actualMinutes: 35 });
    expect(res.body.grams).toEqual([
      { kind: 'lightener', part: 'blue powder', grams: 30 },
      { kind: 'developer', part: '', grams: 60 },
    ]);
    const toner = bowl({
      bowlNo: 2,
      productType: 'toner',
      developerPercent: 2.7,
      ratio: '1:1.5',
      grams: [
        { kind: 'toner', part: '', grams: 20 },
        { kind: 'developer', part: '', grams: 30 },
      ],
    });
    const written = await write(earlier, toner, desk$);
    expect(written.status).toBe(201);
    expect(written.body.developerVolume).toBe(9); // 2.7 ÷ 0.3 = 9 vol
  });

  it('refuses a developer above the salon maximum of 12 %, in percent and volumes, naming developerPercent, and stores nothing', async () => {
    const res = await write(today, bowl({ developerPercent: 12.5 }));
    expect(res.status).toBe(400);
    // 12.5 ÷ 0.3 = 41.67 → 41.7 vol; 12 ÷ 0.3 = 40 vol.
    expect(res.body.error.fields.developerPercent).toMatch(/12\.5 % \(41\.7 vol\) is above this salon's maximum of 12 % \(40 vol\)/);
    expect(res.body.error.fields.developerPercent).toMatch(/12 % of H2O2, 40 volumes/);
    expect((await list(today)).body.logs).toHaveLength(0);
  });

  it('refuses a second bowl with the same number in the same sitting (409 naming bowlNo)', async () => {
    const res = await write(earlier, bowl());
    expect(res.status).toBe(409);
    expect(res.body.error.fields.bowlNo).toBeDefined();
  });

  it('refuses negative grams, a part of no known kind and a ratio like "1:0", naming the fields', async () => {
    const neg = await write(today, bowl({ grams: [{ kind: 'lightener', part: '', grams: -5 }] }));
    expect(neg.status).toBe(400);
    expect(Object.keys(neg.body.error.fields)).toContain('grams.0.grams');
    const kind = await write(today, bowl({ grams: [{ kind: 'glitter', part: '', grams: 5 }] }));
    expect(kind.status).toBe(400);
    expect(Object.keys(kind.body.error.fields)).toContain('grams.0.kind');
    const ratio = await write(today, bowl({ ratio: '1:0' }));
    expect(ratio.status).toBe(400);
    expect(Object.keys(ratio.body.error.fields)).toEqual(['ratio']);
  });

  it('answers hostile input with 400 naming the field, never 5xx, and stores nothing', async () => {
    const cases: [object, string][] = [
      [bowl({ shadeNotes: 'blue\u0000powder' }), 'shadeNotes'],
      [bowl({ grams: [{ kind: 'lightener', part: 'x\u0000', grams: 30 }] }), 'grams.0.part'],
      [bowl({ resultNotes: 'lifted \ud800 even' }), 'resultNotes'],
      [bowl({ grams: [{ kind: 'developer', part: '', grams: 1e308 }] }), 'grams.0.grams'],
      [bowl({ sittingSeq: 2 ** 53 }), 'sittingSeq'],
      [bowl({ bowlNo: -1e308 }), 'bowlNo'],
      [bowl({ developerPercent: Number.MAX_VALUE }), 'developerPercent'],
      [bowl({ grams: 'thirty' }), 'grams'],
      [bowl({ grams: [] }), 'grams'],
      [bowl({ plannedMinutes: 1.5 }), 'plannedMinutes'],
    ];
    for (const [body, field] of cases) {
      const res = await write(today, body);
      expect(res.status, `${field}: ${JSON.stringify(res.body)}`).toBe(400);
      expect(Object.keys(res.body.error.fields ?? {}), field).toContain(field);
    }
    const notJson = await stylist$.write('post', `/api/bookings/${today}/mix-logs`).set('Content-Type', 'application/json').send('{"sittingSeq": 1,');
    expect(notJson.status).toBe(400);
    const bareArray = await write(today, [bowl()]);
    expect(bareArray.status).toBe(400);
    const repeatNul = await repeat(today, { fromBookingId: earlier, sitting: 2 ** 40, intoSitting: 1 });
    expect(repeatNul.status).toBe(400);
    expect(Object.keys(repeatNul.body.error.fields)).toContain('sitting');
    expect((await list(today)).body.logs).toHaveLength(0);
  });
});

describe('writing ahead of the sitting', () => {
  it('lets the stylist write bowls for a booked sitting before it starts (the formula is mixed ahead)', async () => {
    const res = await write(ahead, bowl({ actualMinutes: null, resultNotes: '' }));
    expect(res.status).toBe(201);
    const later = await write(today, bowl({ sittingSeq: 2, actualMinutes: null, resultNotes: '' }), desk$);
    expect(later.status).toBe(201);
    const view = await list(ahead);
    expect(view.body).toMatchObject({ bookingStatus: 'booked' });
    expect(view.body.sittings[0]).toMatchObject({ seq: 1, started: false, totalGrams: 90 });
  });

  it('still refuses a sitting the booking does not have, naming sittingSeq', async () => {
    const res = await write(ahead, bowl({ sittingSeq: 2 }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields.sittingSeq).toMatch(/no sitting 2/);
  });

  it('refuses bowls for a cancelled booking (409), written or repeated, but still shows its mix log', async () => {
    const res = await write(cancelled, bowl());
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/cancelled/);
    expect((await repeat(cancelled, { fromBookingId: earlier, sitting: 1, intoSitting: 1 })).status).toBe(409);
    const view = await list(cancelled, desk$);
    expect(view.status).toBe(200);
    expect(view.body).toMatchObject({ bookingStatus: 'cancelled', logs: [] });
  });
});

describe('who may see and write a mix log', () => {
  it("answers 404 to another salon's staff", async () => {
    const elsewhere = await insertSalon(t.testDb.db);
    const owner = await insertUser(t.testDb.db, elsewhere.salonId, 'owner');
    const outsider$ = await signedInAgent(t.app, owner.email, owner.password);
    expect((await list(earlier, outsider$)).status).toBe(404);
    expect((await write(earlier, bowl({ bowlNo: 9 }), outsider$)).status).toBe(404);
  });

  it('answers 404 to a stylist who does not work on the booking, for reads as for writes, as the booking itself does', async () => {
    expect((await other$.get(`/api/bookings/${earlier}`)).status).toBe(404);
    expect((await list(earlier, other$)).status).toBe(404);
    expect((await write(earlier, bowl({ bowlNo: 9 }), other$)).status).toBe(404);
    expect((await repeat(earlier, { fromBookingId: earlier, sitting: 1, intoSitting: 1 }, other$)).status).toBe(404);
    // Their own booking of the same client answers 200, without the other stylist's sittings to repeat.
    expect((await write(othersBooking, bowl(), desk$)).status).toBe(201);
    const own = await list(othersBooking, other$);
    expect(own.status).toBe(200);
    expect(own.body.repeatSources.map((s: { bookingId: string }) => s.bookingId)).toEqual([othersBooking]);
  });

  it("does not let a stylist copy (and so read) another stylist's bowls; the desk may", async () => {
    const copy = await repeat(today, { fromBookingId: othersBooking, sitting: 1, intoSitting: 1 });
    expect(copy.status).toBe(404);
    const sources = (await list(today)).body.repeatSources.map((s: { bookingId: string; sittingSeq: number }) => `${s.bookingId}|${s.sittingSeq}`);
    expect(sources).not.toContain(`${othersBooking}|1`);
    expect(sources).toEqual(expect.arrayContaining([`${earlier}|1`, `${ahead}|1`, `${today}|2`]));
    const deskSources = (await list(today, desk$)).body.repeatSources.map((s: { bookingId: string }) => s.bookingId);
    expect(deskSources).toContain(othersBooking);
  });
});

describe('repeat last time and product used', () => {
  it('copies the bowls of the earlier sitting into this sitting, without actual minutes or results', async () => {
    const res = await repeat(today, { fromBookingId: earlier, sitting: 1, intoSitting: 1 });
    expect(res.status).toBe(201);
    expect(res.body.copied).toBe(2);
    expect(res.body.logs.map((l: { bowlNo: number; productType: string }) => [l.bowlNo, l.productType])).toEqual([
      [1, 'lightener'],
      [2, 'toner'],
    ]);
    expect(res.body.logs[0]).toMatchObject({
      developerPercent: 6,
      ratio: '1:2',
      plannedMinutes: 40,
      actualMinutes: null,
      resultNotes: '',
      shadeNotes: 'Powder, blue',
    });
    expect(res.body.logs[0].grams).toEqual([
      { kind: 'lightener', part: 'blue powder', grams: 30 },
      { kind: 'developer', part: '', grams: 60 },
    ]);
  });

  it('counts and costs each part as itself: 30 g lightener + 60 g developer is not 90 g lightener', async () => {
    // Worked by hand, sitting 1 of today's booking (bowl 1: lightener 30 g + developer 60 g; bowl 2: toner 20 g
    // + developer 30 g), at costs chosen for the test: lightener 4.5 ¢/g, toner 7 ¢/g, developer 1.2 ¢/g.
    //   lightener 30 g × 4.5 = 135 ¢; toner 20 g × 7 = 140 ¢; developer 60 + 30 = 90 g × 1.2 = 108 ¢
    //   grams 30 + 20 + 90 = 140 g; cost 135 + 140 + 108 = 383 ¢ ($3.83).
    // Before developer has a cost, it says so and the estimate is unknown rather than too low.
    expect(
      (await owner$.write('put', '/api/owner/quote-prices', { correctionCentsPerHour: 9000, productCentsPerGram: { lightener: 4.5, toner: 7 } })).status,
    ).toBe(200);
    const unpriced = (await list(today, desk$)).body.sittings[0];
    expect(unpriced.totals).toEqual([
      { kind: 'lightener', grams: 30, centsPerGram: 4.5, costCents: 135 },
      { kind: 'toner', grams: 20, centsPerGram: 7, costCents: 140 },
      { kind: 'developer', grams: 90, centsPerGram: null, costCents: null },
    ]);
    expect(unpriced).toMatchObject({ totalGrams: 140, estimatedCostCents: null });

    const prices = { correctionCentsPerHour: 9000, productCentsPerGram: { lightener: 4.5, toner: 7, developer: 1.2 } };
    const saved = await owner$.write('put', '/api/owner/quote-prices', prices);
    expect(saved.status).toBe(200);
    expect(saved.body).toEqual(prices);
    const res = await list(today, desk$);
    expect(res.status).toBe(200);
    expect(res.body.maxDeveloperPercent).toBe(12);
    expect(res.body.sittings).toEqual([
      expect.objectContaining({
        seq: 1,
        started: true,
        totalGrams: 140,
        estimatedCostCents: 383,
        totals: [
          { kind: 'lightener', grams: 30, centsPerGram: 4.5, costCents: 135 },
          { kind: 'toner', grams: 20, centsPerGram: 7, costCents: 140 },
          { kind: 'developer', grams: 90, centsPerGram: 1.2, costCents: 108 },
        ],
      }),
      // Sitting 2 (written ahead): lightener 30 g × 4.5 = 135 ¢ + developer 60 g × 1.2 = 72 ¢ = 207 ¢; 90 g.
      expect.objectContaining({ seq: 2, started: false, totalGrams: 90, estimatedCostCents: 207 }),
    ]);
  });

  it('weighs water or cream as "other" without costing it', async () => {
    // Bowl 2 of the booked sitting ahead: toner 20 g + developer 20 g + water 10 g. With bowl 1 (lightener 30 g +
    // developer 60 g): lightener 30 × 4.5 = 135 ¢; toner 20 × 7 = 140 ¢; developer 80 g × 1.2 = 96 ¢; water 10 g
    // not costed. Grams 30 + 20 + 80 + 10 = 140 g; cost 135 + 140 + 96 = 371 ¢.
    const parts = [
      { kind: 'toner', part: '', grams: 20 },
      { kind: 'developer', part: '', grams: 20 },
      { kind: 'other', part: 'water', grams: 10 },
    ];
    expect((await write(ahead, bowl({ bowlNo: 2, productType: 'toner', developerPercent: 3, ratio: '1:1', grams: parts }))).status).toBe(201);
    const s = (await list(ahead)).body.sittings[0];
    expect(s.totals.at(-1)).toEqual({ kind: 'other', grams: 10, centsPerGram: null, costCents: null });
    expect(s).toMatchObject({ totalGrams: 140, estimatedCostCents: 371 });
  });

  it('refuses to copy into a sitting the booking does not have, naming intoSitting', async () => {
    const res = await repeat(today, { fromBookingId: earlier, sitting: 1, intoSitting: 3 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.intoSitting).toBeDefined();
  });
});

describe('parts written before parts had kinds (migration 20261205T0100)', () => {
  it('reads developer words as developer, water as other, product names as that product, the rest as the bowl', async () => {
    const db = t.testDb.db;
    await removePartKinds(db);
    const old = [
      { part: 'lightener', grams: 30 },
      { part: '6% Cream Developer', grams: 60 },
      { part: 'water', grams: 5 },
      { part: 'Bond builder', grams: 2 },
      { part: 'mystery', grams: 1 },
    ];
    const { id } = await db
      .insertInto('mix_logs')
      .values({ salon_id: salon.salonId, booking_id: earlier, sitting_seq: 1, bowl_no: 7, product_type: 'toner', grams: JSON.stringify(old) })
      .returning('id')
      .executeTakeFirstOrThrow();
    await addPartKinds(db);
    const row = await db.selectFrom('mix_logs').select('grams').where('id', '=', id).executeTakeFirstOrThrow();
    expect(row.grams.map((p) => [p.part, p.kind])).toEqual([
      ['lightener', 'lightener'],
      ['6% Cream Developer', 'developer'],
      ['water', 'other'],
      ['Bond builder', 'bond_builder'],
      ['mystery', 'toner'],
    ]);
    // The owner's developer cost can be stored again after the round trip.
    expect((await owner$.write('put', '/api/owner/quote-prices', { correctionCentsPerHour: 9000, productCentsPerGram: { developer: 1 } })).status).toBe(200);
  });
});
