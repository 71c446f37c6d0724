/**
 * Plan vs actual on a book built by hand: the typical actual minutes of a service's steps (salon and per stylist,
 * the last 20 finished visits) and the owner's timekeeping figures, every expected value worked out by hand below.
 *
 * Percentiles follow PostgreSQL's percentile_cont, which is Hyndman and Fan's definition 7 ("Sample quantiles in
 * statistical packages", The American Statistician 50(4), 1996; R's default `quantile` type, and spreadsheets'
 * PERCENTILE.INC): with the n values sorted x[0] ≤ … ≤ x[n−1], the p-quantile sits at h = p × (n − 1) and is
 * x[⌊h⌋] + (h − ⌊h⌋) × (x[⌊h⌋+1] − x[⌊h⌋]).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DateTime } from 'luxon';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService } from '../factories/service';
import { insertTimedVisit } from '../factories/timed-visit';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';

let t: TestApp;
let salon: SalonFixture;
let ada: UserFixture;
let bo: UserFixture;
let owner$: Awaited<ReturnType<typeof signedInAgent>>;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
let ada$: Awaited<ReturnType<typeof signedInAgent>>;
let elsewhere$: Awaited<ReturnType<typeof signedInAgent>>;
const services = { colour: '', toner: '' };

// Planned 20 + 40 (developing at its most) + 10 + 10 + 10 = 90 minutes. "Rinse" comes twice: told apart by which time.
const colourPlan: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Apply', product: 'none', minutes: 20 },
        { kind: 'developing', label: 'Develops', product: 'none', minMinutes: 30, maxMinutes: 40 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 10 },
        { kind: 'hands_on', label: 'Gloss', product: 'none', minutes: 10 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 10 },
      ],
    },
  ],
};
const tonerPlan: StepPlan = { sittings: [{ steps: [{ kind: 'hands_on', label: 'Apply toner', product: 'none', minutes: 10 }] }] };

// February 2027 is before the US change to daylight time (14 March), so Denver is UTC−7.
const at = (date: string, hhmm: string) => DateTime.fromISO(`${date}T${hhmm}`, { zone: 'America/Denver' }).toJSDate();

async function newClient(salonId: string): Promise<string> {
  const row = await t.testDb.db
    .insertInto('clients')
    .values({ salon_id: salonId, name: 'Timed client', email: null, phone: null })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db, { chairs: 2, basins: 1 });
  ada = await insertUser(db, salon.salonId, 'stylist');
  bo = await insertUser(db, salon.salonId, 'stylist');
  await db.updateTable('staff').set({ display_name: 'Ada' }).where('id', '=', ada.staffId!).execute();
  await db.updateTable('staff').set({ display_name: 'Bo' }).where('id', '=', bo.staffId!).execute();
  services.colour = await insertPlannedService(db, salon.salonId, { plan: colourPlan, name: 'Colour' });
  services.toner = await insertPlannedService(db, salon.salonId, { plan: tonerPlan, name: 'Toner' });
  const ownerUser = await insertUser(db, salon.salonId, 'owner');
  const deskUser = await insertUser(db, salon.salonId, 'front_desk');
  owner$ = await signedInAgent(t.app, ownerUser.email, ownerUser.password);
  desk$ = await signedInAgent(t.app, deskUser.email, deskUser.password);
  ada$ = await signedInAgent(t.app, ada.email, ada.password);
  const other = await insertSalon(db);
  const otherOwner = await insertUser(db, other.salonId, 'owner');
  elsewhere$ = await signedInAgent(t.app, otherOwner.email, otherOwner.password);
  const client = await newClient(salon.salonId);
  type More = { startDelay?: number; lateMinutes?: number; status?: 'in_progress'; service?: 'colour' | 'toner' };
  const visit = (who: UserFixture, chair: number, start: Date, actual: number[], more: More = {}) =>
    insertTimedVisit(db, {
      salonId: salon.salonId,
      serviceId: services[more.service ?? 'colour'],
      stylistId: who.staffId!,
      clientId: client,
      chairId: salon.chairs[chair]!,
      basinId: salon.basins[0]!,
      plan: more.service === 'toner' ? tonerPlan : colourPlan,
      plannedStart: start,
      actual,
      startDelay: more.startDelay,
      lateMinutes: more.lateMinutes,
      status: more.status,
    });

  // Ada, Tuesday 2 to Saturday 6 February at 10:00, steps Apply, Develops, Rinse, Gloss, Rinse:
  //   started (min after plan)  actual minutes          chair time  over the 90 planned
  //   +0                        22 40 10 10 12          94          4
  //   +3                        18 40 10 10 14          92          2
  //   +8 (client on time)       25 40 10 10 16          101         11
  //   −2                        20 40 10 10 18          98          8
  //   +12 (client 10 min late)  30 40 10 10 20          110         20
  const adaVisits: Array<[string, number[], number, number]> = [
    ['2027-02-02', [22, 40, 10, 10, 12], 0, 0],
    ['2027-02-03', [18, 40, 10, 10, 14], 3, 0],
    ['2027-02-04', [25, 40, 10, 10, 16], 8, 0],
    ['2027-02-05', [20, 40, 10, 10, 18], -2, 0],
    ['2027-02-06', [30, 40, 10, 10, 20], 12, 10],
  ];
  for (const [day, actual, startDelay, lateMinutes] of adaVisits) await visit(ada, 0, at(day, '10:00'), actual, { startDelay, lateMinutes });
  // Bo, 2 and 3 February at 14:00: started +0 and +20 (client on time); 40/44 + 40 + 10 + 10 + 10 = 110 and 114.
  await visit(bo, 1, at('2027-02-02', '14:00'), [40, 40, 10, 10, 10]);
  await visit(bo, 1, at('2027-02-03', '14:00'), [44, 40, 10, 10, 10], { startDelay: 20 });
  // Not counted: Ada's sitting still under way on 9 February (Apply took 99).
  await visit(ada, 0, at('2027-02-09', '10:00'), [99, 40], { status: 'in_progress' });
  // Ada's toner on 22 days of January at 17:00, Apply toner taking 10, 11, … 31 minutes in that order.
  for (let i = 0; i < 22; i++) await visit(ada, 0, at(`2027-01-${String(i + 1).padStart(2, '0')}`, '17:00'), [10 + i], { service: 'toner' });
}, 120_000);
afterAll(() => t.close());

type Step = { sitting: number; label: string; occurrence: number; salon: unknown; stylists: Array<{ name: string }> };
const stepOf = (body: { steps: Step[] }, label: string, occurrence = 1) => body.steps.find((s) => s.label === label && s.occurrence === occurrence)!;

describe('GET /api/services/:id/typical-minutes', () => {
  it('answers the median and 80th percentile per step for the salon and each stylist, with how many visits', async () => {
    const res = await owner$.get(`/api/services/${services.colour}/typical-minutes`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ serviceId: services.colour, lastVisits: 20, minVisits: 3, forStylistId: null });
    // Apply, salon: 18 20 22 25 30 40 44 (n = 7; the 99 of a sitting still under way is left out).
    //   median h = 0.5 × 6 = 3 → x[3] = 25; 80th h = 0.8 × 6 = 4.8 → 30 + 0.8 × (40 − 30) = 38.
    // Ada: 18 20 22 25 30 (n = 5): median h = 2 → 22; 80th h = 3.2 → 25 + 0.2 × (30 − 25) = 26.
    // Bo: 2 visits, fewer than 3: too few for a number.
    const apply = stepOf(res.body, 'Apply');
    expect(apply.sitting).toBe(1);
    expect(apply.salon).toEqual({ visits: 7, medianMinutes: 25, p80Minutes: expect.closeTo(38, 9) });
    expect(apply.stylists).toEqual([
      { stylistId: ada.staffId, name: 'Ada', visits: 5, medianMinutes: 22, p80Minutes: expect.closeTo(26, 9) },
      { stylistId: bo.staffId, name: 'Bo', visits: 2, medianMinutes: null, p80Minutes: null },
    ]);
    // The second Rinse, salon: 10 10 12 14 16 18 20: median x[3] = 14; 80th h = 4.8 → 16 + 0.8 × (18 − 16) = 17.6.
    // The first Rinse took 10 every time.
    expect(stepOf(res.body, 'Rinse', 2).salon).toEqual({ visits: 7, medianMinutes: 14, p80Minutes: expect.closeTo(17.6, 9) });
    expect(stepOf(res.body, 'Rinse', 1).salon).toEqual({ visits: 7, medianMinutes: 10, p80Minutes: 10 });
  });

  it('takes the last 20 finished visits only', async () => {
    const res = await owner$.get(`/api/services/${services.toner}/typical-minutes`);
    // 22 visits took 10 … 31 minutes; the latest 20 are 12 … 31 (n = 20).
    //   median h = 0.5 × 19 = 9.5 → x[9] = 21, x[10] = 22 → 21.5; 80th h = 0.8 × 19 = 15.2 → 27 + 0.2 × (28 − 27) = 27.2.
    expect(stepOf(res.body, 'Apply toner').salon).toEqual({ visits: 20, medianMinutes: 21.5, p80Minutes: expect.closeTo(27.2, 9) });
  });

  it('names one stylist on request; a stylist reads the salon and themselves only', async () => {
    const forBo = await owner$.get(`/api/services/${services.colour}/typical-minutes?stylistId=${bo.staffId}`);
    expect(forBo.body.forStylistId).toBe(bo.staffId);
    expect(stepOf(forBo.body, 'Apply').stylists.map((s) => s.name)).toEqual(['Bo']);
    const own = await ada$.get(`/api/services/${services.colour}/typical-minutes`);
    expect(own.status).toBe(200);
    expect(own.body.forStylistId).toBe(ada.staffId);
    expect(stepOf(own.body, 'Apply').salon).toEqual({ visits: 7, medianMinutes: 25, p80Minutes: expect.closeTo(38, 9) });
    expect(stepOf(own.body, 'Apply').stylists.map((s) => s.name)).toEqual(['Ada']);
    const colleague = await ada$.get(`/api/services/${services.colour}/typical-minutes?stylistId=${bo.staffId}`);
    expect(colleague.status).toBe(403);
  });

  it('is refused to the desk (403), hidden from another salon (404) and names a bad stylist id (400)', async () => {
    expect((await desk$.get(`/api/services/${services.colour}/typical-minutes`)).status).toBe(403);
    expect((await elsewhere$.get(`/api/services/${services.colour}/typical-minutes`)).status).toBe(404);
    expect((await owner$.get('/api/services/00000000-0000-4000-8000-000000000000/typical-minutes')).status).toBe(404);
    const bad = await owner$.get(`/api/services/${services.colour}/typical-minutes?stylistId=ada`);
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toContain('stylistId');
  });
});

describe('timekeeping in the utilisation figures', () => {
  const week = 'period=custom&from=2027-02-01&to=2027-02-07';

  it('gives the owner the on-time rate, overruns and planned vs actual chair time per stylist', async () => {
    const res = await owner$.get(`/api/owner/utilisation?${week}`);
    expect(res.status).toBe(200);
    // Ada: on time when the first step started no later than 5 min after plan: +0, +3, −2 → 3 of 5. The +12 start
    // followed a client 10 min late (a late arrival); the +8 start did not. Overruns 4 + 2 + 11 + 8 + 20 = 45, 9 a
    // sitting. Planned 5 × 90 = 450 min = 7.5 h; actual 94 + 92 + 101 + 98 + 110 = 495 min = 8.25 h.
    // Bo: +0 on time, +20 not (client on time) → 1 of 2. Overruns 20 + 24 = 44, 22 a sitting; planned 180 min = 3 h,
    // actual 110 + 114 = 224 min.
    const adaRow = { stylistId: ada.staffId, name: 'Ada', sittings: 5, onTime: 3, onTimeRate: 0.6, lateArrivals: 1 };
    const boRow = { stylistId: bo.staffId, name: 'Bo', sittings: 2, onTime: 1, onTimeRate: 0.5, lateArrivals: 0 };
    expect(res.body.timekeeping.stylists).toEqual([
      { ...adaRow, overrunMinutes: 45, overrunPerSitting: 9, plannedChairHours: 7.5, actualChairHours: 8.25 },
      { ...boRow, overrunMinutes: 44, overrunPerSitting: 22, plannedChairHours: 3, actualChairHours: 224 / 60 },
    ]);
    // The salon: 4 of 7 on time; 89 overrun minutes; 630 min = 10.5 h planned, 719 min actual.
    const { stylists: _rows, ...salonFigures } = res.body.timekeeping;
    expect(salonFigures).toEqual({
      sittings: 7,
      onTime: 4,
      onTimeRate: 4 / 7,
      lateArrivals: 1,
      overrunMinutes: 89,
      overrunPerSitting: 89 / 7,
      plannedChairHours: 10.5,
      actualChairHours: 719 / 60,
    });
  });

  it('gives the desk the salon figures without any stylist', async () => {
    const res = await desk$.get(`/api/desk/utilisation?${week}`);
    expect(res.status).toBe(200);
    expect(res.body.timekeeping).toMatchObject({ sittings: 7, onTime: 4, overrunMinutes: 89 });
    expect(res.body.timekeeping).not.toHaveProperty('stylists');
  });

  it('counts nothing in a period without timed sittings', async () => {
    const res = await owner$.get('/api/owner/utilisation?period=day&date=2027-02-10');
    expect(res.body.timekeeping).toMatchObject({ sittings: 0, onTimeRate: null, overrunPerSitting: null, plannedChairHours: 0 });
  });
});
