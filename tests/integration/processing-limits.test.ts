import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertNegativeSkinTest, insertPlannedService } from '../factories/service';
import { futureWeekday, localIso } from '../setup/dates';
import { setupPaths } from '../setup/setup-paths';
import type { PlannedStep, StepPlan } from '@shared/schemas/step-plan.schemas';

// Processing limits, counted from when the first section gets product (common practice, from memory): lightener
// on the head about 45–50 min at most, permanent colour 30–45, toner up to 30, remover 20–60 per application;
// heat roughly halves them. The salon's defaults are those upper ends: 50, 45, 30, 60.

let t: TestApp;
let salon: SalonFixture;
let owner$: Awaited<ReturnType<typeof signedInAgent>>;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
let stylist: UserFixture;
let client: UserFixture;
let serviceId: string;
const tuesday = futureWeekday(2, 2);

const h = (label: string, minutes: number, product: PlannedStep['product'] = 'none'): PlannedStep => ({ kind: 'hands_on', label, product, minutes });
const b = (label: string, minutes: number): PlannedStep => ({ kind: 'basin', label, product: 'none', minutes });
const d = (label: string, min: number, max: number, product: PlannedStep['product'], heat = false): PlannedStep => ({
  kind: 'developing',
  label,
  product,
  minMinutes: min,
  maxMinutes: max,
  heat,
});
const one = (...steps: PlannedStep[]): StepPlan => ({ sittings: [{ steps }] });

// 45 min applying + up to 50 lifting = 95 min of lightener on the hair: over 50.
const tooLong = one(h('Apply lightener', 45, 'lightener'), d('Lightener lifts', 30, 50, 'lightener'), b('Rinse', 15));
// Two sections of 20 + 30 = 50 min, each rinsed before the next: within 50.
const inSections = one(
  h('Apply lightener, section 1 of 2', 20, 'lightener'),
  d('Lightener lifts, section 1 of 2', 20, 30, 'lightener'),
  b('Rinse section 1', 10),
  h('Apply lightener, section 2 of 2', 20, 'lightener'),
  d('Lightener lifts, section 2 of 2', 20, 30, 'lightener'),
  b('Rinse section 2', 10),
);

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db, { chairs: 2, basins: 1 });
  const owner = await insertUser(db, salon.salonId, 'owner');
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  stylist = await insertUser(db, salon.salonId, 'stylist', { skills: ['colour'] });
  client = await insertUser(db, salon.salonId, 'client');
  await insertNegativeSkinTest(db, salon.salonId, client.clientId!);
  serviceId = await insertPlannedService(db, salon.salonId, { plan: inSections, name: 'Lightening in sections', needsSkinTest: true });
  owner$ = await signedInAgent(t.app, owner.email, owner.password);
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
});
afterAll(() => t.close());

const service = (stepPlan: StepPlan, name = 'Lightener service') => ({
  name,
  description: '',
  category: 'colour',
  skill: 'colour',
  priceCents: 20000,
  priceIsFrom: true,
  onlineBookable: false,
  needsSkinTest: true,
  depositKind: 'fixed',
  depositCents: 5000,
  depositPercent: null,
  stepPlan,
});

describe('the salon’s limits', () => {
  it('start at the common-practice defaults and change within the hard maxima, naming the field otherwise', async () => {
    const settings = (await owner$.get(setupPaths.salon)).body;
    expect(settings.processingLimits).toEqual({ lightener: 50, oxidative_colour: 45, toner_oxidative: 30, colour_remover: 60 });
    expect(settings.liftPerSitting).toEqual({ virgin: 3, coloured: 2, compromised: 1 });
    const cases: [object, string][] = [
      [{ processingLimits: { ...settings.processingLimits, lightener: 61 } }, 'processingLimits.lightener'], // hard maximum 60
      [{ processingLimits: { ...settings.processingLimits, toner_oxidative: 1e308 } }, 'processingLimits.toner_oxidative'],
      [{ processingLimits: { ...settings.processingLimits, colour_remover: 4 } }, 'processingLimits.colour_remover'],
      [{ processingLimits: { ...settings.processingLimits, oxidative_colour: '45\u0000' } }, 'processingLimits.oxidative_colour'],
      [{ liftPerSitting: { virgin: 5, coloured: 2, compromised: 1 } }, 'liftPerSitting.virgin'], // at most 4
      [{ liftPerSitting: { virgin: 2, coloured: 3, compromised: 1 } }, 'liftPerSitting.coloured'], // coloured above virgin
    ];
    for (const [change, field] of cases) {
      const res = await owner$.write('put', setupPaths.salon, { ...settings, ...change });
      expect(res.status, JSON.stringify(change)).toBe(400);
      expect(Object.keys(res.body.error.fields), JSON.stringify(change)).toContain(field);
    }
    const raised = await owner$.write('put', setupPaths.salon, {
      ...settings,
      processingLimits: { ...settings.processingLimits, lightener: 55 },
      liftPerSitting: { virgin: 4, coloured: 2, compromised: 1 },
    });
    expect(raised.status).toBe(200);
    expect(raised.body.processingLimits.lightener).toBe(55);
    expect((await owner$.write('put', setupPaths.salon, settings)).status).toBe(200);
  });

  it('refuses a lower limit that a service on the menu would break, naming the limit and the service', async () => {
    const settings = (await owner$.get(setupPaths.salon)).body;
    // "Lightening in sections" keeps lightener on 20 + 30 = 50 min: a 45 min limit is too short for it.
    const res = await owner$.write('put', setupPaths.salon, { ...settings, processingLimits: { ...settings.processingLimits, lightener: 45 } });
    expect(res.status).toBe(409);
    expect(res.body.error.fields['processingLimits.lightener']).toMatch(/Lightening in sections \(sitting 1, step 2 “Lightener lifts, section 1 of 2”\)/);
    expect((await owner$.get(setupPaths.salon)).body.processingLimits.lightener).toBe(50);
  });
});

describe('services', () => {
  it('refuses a service whose developing step is over its family’s limit, naming the step and the limit', async () => {
    const res = await owner$.write('post', setupPaths.services, service(tooLong));
    expect(res.status).toBe(400);
    expect(res.body.error.fields['stepPlan.sittings.0.steps.1']).toMatch(
      /“Lightener lifts”: lightener may be on the hair at most 50 min; this plan keeps it on up to 95 min/,
    );
    const added = await owner$.write('post', setupPaths.services, service(inSections));
    expect(added.status).toBe(201);
    const changed = await owner$.write('put', `/api/owner/setup/services/${added.body.id}`, service(tooLong));
    expect(changed.status).toBe(400);
    expect(Object.keys(changed.body.error.fields)).toEqual(['stepPlan.sittings.0.steps.1']);
  });

  it('halves the limit with heat: 20 min of remover and 15 under heat is over 60 × ½ = 30', async () => {
    const remover = (heat: boolean) =>
      one(h('Apply colour remover', 20, 'colour_remover'), d('Remover processes', 10, 15, 'colour_remover', heat), b('Rinse remover', 20));
    const hot = await owner$.write('post', setupPaths.services, service(remover(true), 'Remover under heat'));
    expect(hot.status).toBe(400);
    expect(hot.body.error.fields['stepPlan.sittings.0.steps.1']).toMatch(/at most 30 min with heat/);
    expect((await owner$.write('post', setupPaths.services, service(remover(false), 'Remover without heat'))).status).toBe(201);
  });
});

describe('the desk’s plan for one booking', () => {
  it('refuses options and a booking for a plan over the limit, naming the step; the same service within it books', async () => {
    const ask = (stepPlan: StepPlan) =>
      desk$.write('post', '/api/booking-options', { clientId: client.clientId, serviceId, stepPlan, stylistId: null, earliestDate: tuesday });
    const refused = await ask(tooLong);
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields['stepPlan.sittings.0.steps.1']).toMatch(/“Lightener lifts”.*at most 50 min/);
    const booking = (stepPlan: StepPlan, key: string) =>
      desk$.write('post', '/api/bookings', {
        clientId: client.clientId,
        serviceId,
        stepPlan,
        stylistId: stylist.staffId,
        start: localIso(tuesday, '10:00'),
        idempotencyKey: key,
      });
    const notBooked = await booking(tooLong, 'limits-too-long-01');
    expect(notBooked.status).toBe(400);
    expect(Object.keys(notBooked.body.error.fields)).toEqual(['stepPlan.sittings.0.steps.1']);
    expect(await t.testDb.db.selectFrom('bookings').select('id').where('salon_id', '=', salon.salonId).execute()).toEqual([]);
    expect((await ask(inSections)).status).toBe(200);
    expect((await booking(inSections, 'limits-sections-01')).status).toBe(201);
  });
});
