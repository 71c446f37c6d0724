import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { correctionPlan, insertNegativeSkinTest, insertPlannedService } from '../factories/service';
import { futureWeekday } from '../setup/dates';

let t: TestApp;
let salon: SalonFixture;
let stylist: UserFixture;
let serviceId: string;
let stylist$: Awaited<ReturnType<typeof signedInAgent>>;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
const tuesday = futureWeekday(2, 3);
const DAY = 86_400_000;

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db, { chairs: 2, basins: 1 });
  stylist = await insertUser(db, salon.salonId, 'stylist', { skills: ['colour'] });
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  serviceId = await insertPlannedService(db, salon.salonId, { needsSkinTest: true });
  stylist$ = await signedInAgent(t.app, stylist.email, stylist.password);
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
});
afterAll(() => t.close());

const iso = (ms: number) => new Date(ms).toISOString();

/** Options for the client, then an attempt to book the first one anyway (as a stale screen would). */
async function tryToBook(clientId: string) {
  const options = await desk$.write('post', '/api/booking-options', { clientId, serviceId, stepPlan: correctionPlan, stylistId: null, earliestDate: tuesday });
  const booked = await desk$.write('post', '/api/bookings', {
    clientId,
    serviceId,
    stepPlan: correctionPlan,
    stylistId: stylist.staffId,
    start: `${tuesday}T09:00:00-07:00`,
    idempotencyKey: `k-${Math.random()}`,
  });
  return { skinTest: options.body.skinTest, options: options.body.options, booked };
}

describe('skin tests gate oxidative colour', () => {
  it.each([
    ['positive', /showed a reaction\. No oxidative colour until an owner records a clearance/],
    ['unclear', /was unclear\. A new test is needed/],
  ] as const)('a %s result recorded on the client card blocks colour bookings with a clear message', async (result, message) => {
    const client = await insertUser(t.testDb.db, salon.salonId, 'client');
    await insertNegativeSkinTest(t.testDb.db, salon.salonId, client.clientId!, 60);
    const recorded = await stylist$.write('post', `/api/clients/${client.clientId!}/skin-tests`, {
      appliedAt: iso(Date.now() - 3 * DAY),
      readAt: iso(Date.now() - DAY),
      result,
      product: 'Permanent 6.0 with 6 % developer',
      notes: '',
    });
    expect(recorded.status).toBe(201);
    expect(recorded.body.recordedByName).toBe(`stylist ${stylist.email.split('.')[1]}`);
    const { skinTest, options, booked } = await tryToBook(client.clientId!);
    expect(skinTest).toMatchObject({ required: true, ok: false });
    expect(skinTest.message).toMatch(message);
    expect(options).toEqual([]);
    expect(booked.status).toBe(409);
    expect(booked.body.error.code).toBe('SKIN_TEST');
    expect(booked.body.error.message).toMatch(message);
  });

  it('refuses a read result without the time it was read, naming readAt, and stores nothing', async () => {
    const client = await insertUser(t.testDb.db, salon.salonId, 'client');
    const res = await stylist$.write('post', `/api/clients/${client.clientId!}/skin-tests`, {
      appliedAt: iso(Date.now() - DAY),
      readAt: null,
      result: 'negative',
      product: '',
      notes: '',
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.readAt).toMatch(/time it was read/);
    expect((await stylist$.get(`/api/clients/${client.clientId!}/skin-tests`)).body.tests).toEqual([]);
  });
});

describe('strand tests', () => {
  const strand = (over: object = {}) => ({
    testedAt: iso(Date.now() - DAY),
    tested: 'Lightener 1:2 on a nape strand',
    productType: 'lightener',
    developerPercent: 6,
    minutes: 30,
    result: 'passed',
    notes: 'Lifted to 8, strand stayed strong',
    photoId: null,
    ...over,
  });
  const coloured = {
    currentLevel: 4,
    targetLevel: 7,
    history: { natural: false, permanent: true, directDye: false, boxDye: false, henna: false, previousLightening: false },
    length: 'medium',
    density: 'medium',
    elasticity: 'good',
    porosity: 'normal',
    conditionNotes: '',
    strandTest: 'none',
    wantsCut: false,
    notes: '',
  };
  const warningCodes = async (clientId: string) =>
    (
      (await stylist$.write('post', '/api/consultations/propose', { consultation: coloured, serviceId: null, clientId })).body.warnings as { code: string }[]
    ).map((w) => w.code);

  it('refuses a developer above the salon maximum (12 %) and a strand photo of another client, storing nothing', async () => {
    const client = await insertUser(t.testDb.db, salon.salonId, 'client');
    const strong = await stylist$.write('post', `/api/clients/${client.clientId}/strand-tests`, strand({ developerPercent: 15 }));
    expect(strong.status).toBe(400);
    expect(strong.body.error.fields.developerPercent).toMatch(/12/);
    const zero = await stylist$.write('post', `/api/clients/${client.clientId}/strand-tests`, strand({ minutes: 0, tested: '' }));
    expect(Object.keys(zero.body.error.fields).sort()).toEqual(['minutes', 'tested']);
    expect((await stylist$.get(`/api/clients/${client.clientId}/strand-tests`)).body.tests).toEqual([]);
  });

  it('a lightening quote on previously coloured hair warns until a strand test is recorded', async () => {
    const client = await insertUser(t.testDb.db, salon.salonId, 'client');
    expect(await warningCodes(client.clientId!)).toContain('strand_test_missing');
    const res = await stylist$.write('post', `/api/clients/${client.clientId}/strand-tests`, strand());
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ result: 'passed', developerPercent: 6, minutes: 30 });
    expect(await warningCodes(client.clientId!)).not.toContain('strand_test_missing');
    // A failed strand test on record turns the warning into a stop.
    await stylist$.write('post', `/api/clients/${client.clientId}/strand-tests`, strand({ testedAt: iso(Date.now() - 1000), result: 'failed' }));
    expect(await warningCodes(client.clientId!)).toContain('strand_test_failed');
  });
});
