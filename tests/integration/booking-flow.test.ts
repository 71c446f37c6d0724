import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { correctionPlan, insertNegativeSkinTest, insertPlannedService } from '../factories/service';
import { futureWeekday, localIso } from '../setup/dates';

let t: TestApp;
let salon: SalonFixture;
let desk: UserFixture;
let ana: UserFixture;
let client: UserFixture;
let serviceId: string;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
const tuesday = futureWeekday(2, 3); // a Tuesday three weeks ahead: open, and inside the engine's horizon

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db, { chairs: 2, basins: 1 });
  desk = await insertUser(db, salon.salonId, 'front_desk');
  ana = await insertUser(db, salon.salonId, 'stylist', { skills: ['colour'] });
  client = await insertUser(db, salon.salonId, 'client');
  serviceId = await insertPlannedService(db, salon.salonId, { needsSkinTest: true });
  await insertNegativeSkinTest(db, salon.salonId, client.clientId!);
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
});
afterAll(() => t.close());

const ask = (over: object = {}) =>
  desk$.write('post', '/api/booking-options', {
    clientId: client.clientId,
    serviceId,
    stepPlan: correctionPlan,
    stylistId: null,
    earliestDate: tuesday,
    ...over,
  });

describe('POST /api/booking-options', () => {
  it('answers the earliest plan per stylist and day, sittings within their day range, with chair and hands-free minutes', async () => {
    const res = await ask();
    expect(res.status).toBe(200);
    expect(res.body.skinTest).toMatchObject({ required: true, ok: true });
    const first = res.body.options[0];
    expect(first.stylistId).toBe(ana.staffId);
    expect(first.sittings[0].start).toBe(localIso(tuesday, '09:00'));
    const days = (Date.parse(first.sittings[1].start) - Date.parse(first.sittings[0].start)) / 86_400_000;
    expect(days).toBeGreaterThanOrEqual(1);
    expect(days).toBeLessThan(8);
    // 45 + 30 + 15 + 50 = 140 and 30 + 30 + 15 + 15 = 90 chair minutes at the shortest developing times.
    expect(first.chairMinutes).toBe(230);
    expect(first.handsFreeMinutes).toBe(60);
    expect(first.sittings[0].steps.map((s: { label: string }) => s.label)).toEqual(['Apply lightener', 'Lightener lifts', 'Rinse', 'Tone and dry']);
  });

  it('refuses a step plan whose least developing time exceeds its most, naming the field, and zero minutes', async () => {
    const bad = structuredClone(correctionPlan) as typeof correctionPlan;
    const dev = bad.sittings[0]!.steps[1] as { minMinutes: number; maxMinutes: number };
    dev.minMinutes = 60;
    dev.maxMinutes = 30;
    const res = await ask({ stepPlan: bad });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toContain('stepPlan.sittings.0.steps.1.maxMinutes');
    const zero = structuredClone(correctionPlan) as typeof correctionPlan;
    (zero.sittings[0]!.steps[0] as { minutes: number }).minutes = 0;
    expect((await ask({ stepPlan: zero })).status).toBe(400);
  });

  it('for a client without a skin test, answers no options and says why', async () => {
    const newcomer = await insertUser(t.testDb.db, salon.salonId, 'client');
    const res = await ask({ clientId: newcomer.clientId });
    expect(res.body.skinTest.ok).toBe(false);
    expect(res.body.skinTest.message).toMatch(/Book a skin test first/);
    expect(res.body.options).toEqual([]);
  });
});

describe('POST /api/bookings', () => {
  const book = (start: string, key: string, over: object = {}) =>
    desk$.write('post', '/api/bookings', {
      clientId: client.clientId,
      serviceId,
      stepPlan: correctionPlan,
      stylistId: ana.staffId,
      start,
      idempotencyKey: key,
      ...over,
    });

  it('books the chosen option as one booking with both sittings; a retry with the same key answers the same booking', async () => {
    const option = (await ask()).body.options[0];
    // Ask for the other chair than the engine chose: a free chair the desk picked is kept.
    const other = (id: string) => (id === salon.chairs[0] ? salon.chairs[1] : salon.chairs[0]);
    const chairIds = option.sittings.map((s: { chairId: string }) => other(s.chairId));
    const res = await book(option.sittings[0].start, 'flow-key-0001', { chairIds });
    expect(res.status).toBe(201);
    expect(res.body.sittings.map((s: { chairId: string }) => s.chairId)).toEqual(chairIds);
    expect(res.body.sittings).toHaveLength(2);
    expect(res.body.sittings[1].start).toBe(option.sittings[1].start.replace(/(T\d\d:\d\d)/, '$1:00'));
    // A retry resends the same request (the same key with another request is refused: booking-concurrency.test.ts).
    const again = await book(option.sittings[0].start, 'flow-key-0001', { chairIds });
    expect(again.status).toBe(201);
    expect(again.body.id).toBe(res.body.id);
    const rows = await t.testDb.db.selectFrom('bookings').select('id').where('client_id', '=', client.clientId!).execute();
    expect(rows).toHaveLength(1);
    // Round trip: the booked start is no longer offered.
    const after = (await ask()).body.options;
    expect(after.some((o: { sittings: { start: string }[] }) => o.sittings[0]!.start === option.sittings[0].start)).toBe(false);
  });

  it('the same time with another key → 409 with what is taken', async () => {
    const res = await book(localIso(tuesday, '09:00'), 'flow-key-0002');
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/busy|chair/);
  });

  it('refuses off-grid, past and out-of-hours starts, and a stylist without the skill, storing nothing', async () => {
    const before = await t.testDb.db.selectFrom('bookings').select('id').execute();
    expect((await book(localIso(tuesday, '13:02'), 'flow-key-0003')).body.error.fields.start).toMatch(/grid/);
    expect((await book('2020-01-07T10:00-07:00', 'flow-key-0004')).body.error.fields.start).toMatch(/passed/);
    expect((await book(localIso(futureWeekday(2, 60), '10:00'), 'flow-key-0008')).body.error.fields.start).toMatch(/365 days ahead/);
    const late = await book(localIso(tuesday, '17:30'), 'flow-key-0005');
    expect(late.status).toBe(409);
    expect(late.body.error.message).toMatch(/hours/);
    const cutter = await insertUser(t.testDb.db, salon.salonId, 'stylist', { skills: ['cut'] });
    expect((await book(localIso(tuesday, '13:00'), 'flow-key-0006', { stylistId: cutter.staffId })).body.error.fields.stylistId).toMatch(/skill/);
    expect(await t.testDb.db.selectFrom('bookings').select('id').execute()).toHaveLength(before.length);
  });

  it('refuses colour before the skin-test lead time has passed, and allows it after', async () => {
    const fresh = await insertUser(t.testDb.db, salon.salonId, 'client');
    // A skin test applied on the Tuesday at 10:00 and not read yet: the 48-hour lead time (common practice,
    // Cosmetics Europe Recommendation No 27) allows colour from Thursday 10:00.
    await t.testDb.db
      .insertInto('skin_tests')
      .values({
        salon_id: salon.salonId,
        client_id: fresh.clientId!,
        applied_at: new Date(localIso(tuesday, '10:00')),
        read_at: null,
        result: 'pending',
        recorded_by: null,
      })
      .execute();
    const early = await book(localIso(tuesday, '13:00'), 'flow-key-0007', { clientId: fresh.clientId });
    expect(early.status).toBe(409);
    expect(early.body.error.code).toBe('SKIN_TEST');
    const options = (await ask({ clientId: fresh.clientId })).body;
    expect(Date.parse(options.options[0].sittings[0].start)).toBeGreaterThanOrEqual(Date.parse(localIso(tuesday, '10:00')) + 48 * 3_600_000);
  });
});
