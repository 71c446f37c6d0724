import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertPlannedService } from '../factories/service';
import { futureWeekday, localIso } from '../setup/dates';
import { setupPaths } from '../setup/setup-paths';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { emptyHairHistory } from '@shared/schemas/hair-history.schemas';

// Every way oxidative colour could once be booked without a valid skin test, tried at the API. The rule: a test
// counts as passed only when read negative, at least 48 hours before the colour (Cosmetics Europe Recommendation
// No 27, 2023: the allergy alert test is read 48 hours after it is applied), and a positive reaction at any time
// blocks oxidative colour until an owner records a clearance.

let t: TestApp;
let salon: SalonFixture;
let slug: string;
let ana: UserFixture;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
let owner$: Awaited<ReturnType<typeof signedInAgent>>;
let rootColour: string; // an oxidative colour service whose "needs skin test" box is off (the box once decided)
let blowDry: string;
const tuesday = futureWeekday(2, 2);
const HOUR = 3_600_000;
const DAY = 24 * HOUR;

const oxidative: StepPlan = {
  sittings: [
    {
      steps: [
        // 10 + 35 = 45 min on the hair: within the default permanent-colour limit, so only the skin-test rule refuses.
        { kind: 'hands_on', label: 'Apply colour to regrowth', product: 'oxidative_colour', minutes: 10 },
        { kind: 'developing', label: 'Colour develops', product: 'oxidative_colour', minMinutes: 30, maxMinutes: 35 },
        { kind: 'basin', label: 'Rinse', product: 'none', minutes: 15 },
      ],
    },
  ],
};
const dryOnly: StepPlan = { sittings: [{ steps: [{ kind: 'hands_on', label: 'Blow-dry', product: 'none', minutes: 30 }] }] };

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db, { chairs: 3, basins: 1 });
  slug = (await db.selectFrom('salons').select('slug').where('id', '=', salon.salonId).executeTakeFirstOrThrow()).slug;
  ana = await insertUser(db, salon.salonId, 'stylist', {
    skills: ['colour', 'finish'],
    hours: { rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '21:00' },
  });
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  const owner = await insertUser(db, salon.salonId, 'owner');
  rootColour = await insertPlannedService(db, salon.salonId, { name: 'Root colour', plan: oxidative, needsSkinTest: false, depositCents: 0 });
  blowDry = await insertPlannedService(db, salon.salonId, {
    name: 'Blow-dry',
    plan: dryOnly,
    skill: 'finish',
    category: 'treatment',
    needsSkinTest: false,
    depositCents: 0,
  });
  await db.updateTable('services').set({ online_bookable: true }).where('id', '=', rootColour).execute();
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
  owner$ = await signedInAgent(t.app, owner.email, owner.password);
});
afterAll(() => t.close());

type Test = { appliedDaysAgo: number; result: 'pending' | 'negative' | 'positive' | 'unclear'; recordedDaysAgo?: number };

/** A new client with these skin tests on record (inserted as the desk would have recorded them). */
async function clientWith(tests: Test[]) {
  const client = await insertUser(t.testDb.db, salon.salonId, 'client');
  for (const test of tests) {
    const appliedAt = new Date(Date.now() - test.appliedDaysAgo * DAY);
    const readAt = test.result === 'pending' ? null : new Date(appliedAt.getTime() + 48 * HOUR);
    const createdAt = new Date(Date.now() - (test.recordedDaysAgo ?? Math.max(0, test.appliedDaysAgo - 2)) * DAY);
    await t.testDb.db
      .insertInto('skin_tests')
      .values({
        salon_id: salon.salonId,
        client_id: client.clientId!,
        applied_at: appliedAt,
        read_at: readAt,
        result: test.result,
        recorded_by: null,
        created_at: createdAt,
      })
      .execute();
  }
  return client;
}

let keys = 0;
const book = (clientId: string, serviceId: string, stepPlan: StepPlan, start = localIso(tuesday, '10:00'), extra: object = {}) =>
  desk$.write('post', '/api/bookings', {
    clientId,
    serviceId,
    stepPlan,
    stylistId: ana.staffId,
    start,
    idempotencyKey: `doors-${++keys}-${Date.now()}`,
    ...extra,
  });

function expectRefused(res: { status: number; body: { error: { code: string; message: string } } }, why: RegExp) {
  expect(res.status).toBe(409);
  expect(res.body.error.code).toBe('SKIN_TEST');
  expect(res.body.error.message).toMatch(why);
}

describe('the ways round, each refused with the reason', () => {
  it('a positive test followed by a newer test that is merely applied, or booked', async () => {
    const client = await clientWith([
      { appliedDaysAgo: 60, result: 'positive' },
      { appliedDaysAgo: 2, result: 'pending', recordedDaysAgo: 2 },
    ]);
    expectRefused(await book(client.clientId!, rootColour, oxidative), /showed a reaction/);
    const options = await desk$.write('post', '/api/booking-options', {
      clientId: client.clientId,
      serviceId: rootColour,
      stepPlan: oxidative,
      stylistId: null,
      earliestDate: tuesday,
    });
    expect(options.body.skinTest).toMatchObject({ ok: false, status: 'blocked' });
    expect(options.body.options).toEqual([]);
  });

  it('a test applied five months ago and never read', async () => {
    const client = await clientWith([{ appliedDaysAgo: 150, result: 'pending', recordedDaysAgo: 150 }]);
    expectRefused(await book(client.clientId!, rootColour, oxidative), /never read/);
  });

  it('no test at all, with the colour booked under a service whose box is off, as another service, or in a desk-edited plan', async () => {
    const client = await clientWith([]);
    expectRefused(await book(client.clientId!, rootColour, oxidative), /No skin test is on record/);
    // The colour steps booked under a blow-dry (as a quote booked as another service would be).
    expectRefused(await book(client.clientId!, blowDry, oxidative), /No skin test is on record/);
    // The desk edits a blow-dry's plan and adds an oxidative toner step.
    const edited: StepPlan = {
      sittings: [{ steps: [{ kind: 'hands_on', label: 'Gloss', product: 'toner_oxidative', minutes: 20 }, ...dryOnly.sittings[0]!.steps] }],
    };
    expectRefused(await book(client.clientId!, blowDry, edited), /No skin test is on record/);
    // The same blow-dry without colour books as before.
    expect((await book(client.clientId!, blowDry, dryOnly, localIso(tuesday, '16:00'))).status).toBe(201);
  });

  it('a positive and an unread test applied at the same moment, in either recorded order', async () => {
    for (const order of [
      [0, 1],
      [1, 0],
    ]) {
      const tests: Test[] = [
        { appliedDaysAgo: 3, result: 'positive', recordedDaysAgo: 1 },
        { appliedDaysAgo: 3, result: 'pending', recordedDaysAgo: 3 },
      ];
      const client = await clientWith(order.map((i) => tests[i]!));
      expectRefused(await book(client.clientId!, rootColour, oxidative), /showed a reaction/);
    }
  });

  it('the salon cannot set a lead time under 48 hours', async () => {
    const settings = (await owner$.get(setupPaths.salon)).body;
    for (const hours of [0, 24, 47]) {
      const res = await owner$.write('put', setupPaths.salon, { ...settings, skinTestLeadHours: hours });
      expect(res.status).toBe(400);
      expect(res.body.error.fields.skinTestLeadHours).toMatch(/At least 48 hours/);
    }
    expect(
      (await t.testDb.db.selectFrom('salons').select('skin_test_lead_hours').where('id', '=', salon.salonId).executeTakeFirstOrThrow()).skin_test_lead_hours,
    ).toBe(48);
  });

  it('a test applied 40 hours before the colour is refused; 48 hours lets the desk book it as waiting on the test', async () => {
    const client = await clientWith([{ appliedDaysAgo: 1, result: 'pending', recordedDaysAgo: 1 }]);
    const applied = (await t.testDb.db.selectFrom('skin_tests').select('applied_at').where('client_id', '=', client.clientId!).executeTakeFirstOrThrow())
      .applied_at;
    const tooSoon = new Date(applied.getTime() + 40 * HOUR);
    // A start on the salon's grid the day after tomorrow at the earliest; 40 h after the test is before that.
    const later = localIso(futureWeekday(3, 2), '10:00');
    expect(tooSoon.getTime()).toBeLessThan(Date.parse(later));
    const res = await book(client.clientId!, rootColour, oxidative, later);
    expect(res.status).toBe(201);
  });
});

describe('other doors use the same rule', () => {
  it('a client with a negative test read 10 days ago still books colour', async () => {
    const client = await clientWith([{ appliedDaysAgo: 10, result: 'negative' }]);
    expect((await book(client.clientId!, rootColour, oxidative, localIso(tuesday, '13:00'))).status).toBe(201);
  });

  it('a move to a date after the test stops being valid is refused', async () => {
    const client = await clientWith([{ appliedDaysAgo: 170, result: 'negative' }]);
    // Valid until 182 days after it was applied: 12 days from now. Booked within, then moved 4 weeks on.
    const inside = localIso(futureWeekday(4, 1), '10:00');
    const booked = await book(client.clientId!, rootColour, oxidative, inside);
    expect(booked.status).toBe(201);
    const moved = await desk$.write('post', `/api/bookings/${booked.body.id}/move`, { sitting: 1, start: localIso(futureWeekday(4, 5), '10:00') });
    expectRefused(moved, /after the skin test stops being valid/);
  });

  it('a window fill with an oxidative toner for a walk-in is refused; the same fill without colour is not', async () => {
    const toner = await insertPlannedService(t.testDb.db, salon.salonId, {
      name: 'Gloss with developer',
      needsSkinTest: false,
      plan: {
        sittings: [
          {
            steps: [
              { kind: 'hands_on', label: 'Apply gloss', product: 'toner_oxidative', minutes: 10 },
              { kind: 'developing', label: 'Gloss develops', product: 'toner_oxidative', minMinutes: 10, maxMinutes: 20 },
              { kind: 'basin', label: 'Rinse', product: 'none', minutes: 10 },
            ],
          },
        ],
      },
    });
    const fill = (serviceId: string, key: string) =>
      desk$.write('post', '/api/windows/fill', {
        stylistId: ana.staffId,
        serviceId,
        start: localIso(tuesday, '18:00'),
        walkIn: { name: 'Walk-in Wren' },
        idempotencyKey: key,
      });
    expectRefused(await fill(toner, 'doors-fill-1'), /No skin test is on record/);
    expect((await fill(blowDry, 'doors-fill-2')).status).toBe(201);

    // Offering the oxidative gloss to a standby client without a test is refused before any link goes out.
    const waiting = await clientWith([]);
    const entry = await desk$.write('post', '/api/standby', {
      clientId: waiting.clientId,
      serviceIds: [toner],
      stylistId: null,
      availability: [{ weekdays: [2, 3, 4, 5, 6], from: '09:00', to: '20:00' }],
    });
    expect(entry.status).toBe(201);
    const offered = await desk$.write('post', '/api/windows/offer', {
      stylistId: ana.staffId,
      serviceId: toner,
      start: localIso(tuesday, '19:00'),
      standbyEntryIds: [entry.body.id],
    });
    expectRefused(offered, /cannot be offered to .*No skin test is on record/);
  });

  it('online: a hold for colour cannot be claimed on an unread test (waiting is for the desk only)', async () => {
    const client = await clientWith([{ appliedDaysAgo: 2, result: 'pending', recordedDaysAgo: 2 }]);
    const visitor = await anonymousAgent(t.app);
    const held = await visitor.write(
      'post',
      '/api/public/holds',
      { salonSlug: slug, serviceId: rootColour, stylistId: ana.staffId, start: localIso(futureWeekday(5, 3), '10:00') },
      { 'X-Forwarded-For': '10.9.0.1' },
    );
    expect(held.status).toBe(201);
    const c = await signedInAgent(t.app, client.email, client.password);
    const claim = await c.write('post', `/api/me/holds/${held.body.holdId}/claim`, { secret: held.body.holdSecret });
    expectRefused(claim, /read negative first/);
  });
});

describe('a reaction recorded later flags the bookings it affects', () => {
  it('flags the booking at once, holds its reminders, refunds its deposit in full on cancelling; only the owner clears, and colour then needs a new negative test', async () => {
    const client = await clientWith([{ appliedDaysAgo: 20, result: 'negative' }]);
    await t.testDb.db
      .updateTable('clients')
      .set({ email: `flag.${Date.now()}@example.test` })
      .where('id', '=', client.clientId!)
      .execute();
    const booked = await book(client.clientId!, rootColour, oxidative, localIso(futureWeekday(3, 3), '10:00'));
    expect(booked.status).toBe(201);
    const id = booked.body.id as string;
    await t.testDb.db.updateTable('bookings').set({ deposit_cents: 4000 }).where('id', '=', id).execute();
    expect((await desk$.get(`/api/bookings/${id}`)).body.skinTest.status).toBe('passed');
    const queued = () =>
      t.testDb.db.selectFrom('messages').select(['kind', 'status']).where('booking_id', '=', id).where('kind', 'like', 'reminder%').execute();
    expect((await queued()).every((m) => m.status === 'queued')).toBe(true);
    expect((await queued()).length).toBeGreaterThan(0);

    // A new test (e.g. before another service) reads positive.
    const recorded = await desk$.write('post', `/api/clients/${client.clientId!}/skin-tests`, {
      appliedAt: new Date(Date.now() - 3 * DAY).toISOString(),
      readAt: new Date(Date.now() - DAY).toISOString(),
      result: 'positive',
      product: 'Permanent colour with 6 % developer',
      notes: 'Redness behind the ear',
    });
    expect(recorded.status).toBe(201);
    const view = (await desk$.get(`/api/bookings/${id}`)).body;
    expect(view.skinTest).toMatchObject({ status: 'blocked', message: expect.stringMatching(/showed a reaction/) });
    expect((await queued()).every((m) => m.status === 'dropped')).toBe(true);

    // Only the owner may clear, with a reason; the desk is turned away.
    expect(
      (await desk$.write('post', `/api/clients/${client.clientId!}/skin-test-clearances`, { reason: 'Written advice from the client’s dermatologist, 2 Dec' }))
        .status,
    ).toBe(403);
    expect((await owner$.write('post', `/api/clients/${client.clientId!}/skin-test-clearances`, { reason: 'short' })).status).toBe(400);
    const cleared = await owner$.write('post', `/api/clients/${client.clientId!}/skin-test-clearances`, {
      reason: 'Written advice from the client’s dermatologist, 2 Dec',
    });
    expect(cleared.status).toBe(201);
    const list = (await desk$.get(`/api/clients/${client.clientId!}/skin-tests`)).body;
    expect(list.clearances).toMatchObject([{ reason: 'Written advice from the client’s dermatologist, 2 Dec' }]);
    // Cleared, but the newest reading is still the reaction: colour needs a new negative test.
    expect((await desk$.get(`/api/bookings/${id}`)).body.skinTest.status).toBe('blocked');

    const cancelled = await desk$.write('post', `/api/bookings/${id}/cancel`, { reason: 'Skin test showed a reaction' });
    expect(cancelled.status).toBe(200);
    expect(cancelled.body.depositOutcome).toBe('refunded');
  });

  it('a booking on an unread test is kept as waiting: the client is not told it is confirmed, and a negative reading makes it passed', async () => {
    const client = await clientWith([{ appliedDaysAgo: 1, result: 'pending', recordedDaysAgo: 1 }]);
    await t.testDb.db
      .updateTable('clients')
      .set({ email: `wait.${Date.now()}@example.test` })
      .where('id', '=', client.clientId!)
      .execute();
    const booked = await book(client.clientId!, rootColour, oxidative, localIso(futureWeekday(4, 3), '10:00'));
    expect(booked.status).toBe(201);
    expect(booked.body.skinTest.status).toBe('waiting');
    const notice = await t.testDb.db
      .selectFrom('messages')
      .select(['subject', 'body'])
      .where('booking_id', '=', booked.body.id)
      .where('kind', '=', 'confirmation')
      .where('channel', '=', 'email')
      .executeTakeFirstOrThrow();
    expect(notice.subject).toMatch(/^Kept for you, waiting on your skin test/);
    expect(notice.body).not.toMatch(/You're booked/);
    const test = (await desk$.get(`/api/clients/${client.clientId!}/skin-tests`)).body.tests[0];
    const read = await desk$.write('post', `/api/clients/${client.clientId!}/skin-tests/${test.id}/reading`, {
      readAt: new Date().toISOString(),
      result: 'negative',
    });
    expect(read.status).toBe(200);
    expect((await desk$.get(`/api/bookings/${booked.body.id}`)).body.skinTest.status).toBe('passed');
  });
});

describe('hair history reaches booking', () => {
  it('"I have reacted to hair colour" blocks online colour even with a negative test, and flags the client for the desk', async () => {
    const client = await clientWith([{ appliedDaysAgo: 10, result: 'negative' }]);
    const c = await signedInAgent(t.app, client.email, client.password);
    const saved = await c.write('put', '/api/me/hair-history', {
      ...emptyHairHistory(),
      previousReaction: { answer: 'yes', details: 'Itchy scalp and swelling after a box dye, 2024' },
    });
    expect(saved.status).toBe(200);
    const visitor = await anonymousAgent(t.app);
    const held = await visitor.write(
      'post',
      '/api/public/holds',
      { salonSlug: slug, serviceId: rootColour, stylistId: ana.staffId, start: localIso(futureWeekday(5, 4), '10:00') },
      { 'X-Forwarded-For': '10.9.0.2' },
    );
    expect(held.status).toBe(201);
    expectRefused(
      await c.write('post', `/api/me/holds/${held.body.holdId}/claim`, { secret: held.body.holdSecret }),
      /reacted to hair colour before.*book a consultation/,
    );
    const card = (await desk$.get(`/api/clients/${client.clientId!}`)).body;
    expect(card.reportedReaction).toBe('Itchy scalp and swelling after a box dye, 2024');
  });

  it('the hair-history form cannot be saved with the reaction question left unanswered', async () => {
    const client = await insertUser(t.testDb.db, salon.salonId, 'client');
    const c = await signedInAgent(t.app, client.email, client.password);
    const res = await c.write('put', '/api/me/hair-history', { ...emptyHairHistory() });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['previousReaction.answer']).toBe('Choose an answer');
  });
});

describe('age', () => {
  it('oxidative colour for a client under 16 on the day is refused online and at the desk until a guardian consent is recorded', async () => {
    const client = await clientWith([{ appliedDaysAgo: 10, result: 'negative' }]);
    const start = localIso(futureWeekday(2, 5), '10:00');
    // Fifteen on the day: born one day less than 16 years before the sitting's date (worked from the date itself).
    const sittingDay = start.slice(0, 10);
    const [y, m, d] = sittingDay.split('-').map(Number);
    const dob = new Date(Date.UTC(y! - 16, m! - 1, d! + 1)).toISOString().slice(0, 10);
    const c = await signedInAgent(t.app, client.email, client.password);
    expect((await c.write('put', '/api/me/date-of-birth', { dateOfBirth: '2999-01-01' })).status).toBe(400);
    expect((await c.write('put', '/api/me/date-of-birth', { dateOfBirth: dob })).status).toBe(200);

    const refused = await book(client.clientId!, rootColour, oxidative, start);
    expect(refused.status).toBe(409);
    expect(refused.body.error).toMatchObject({ code: 'AGE_CONSENT', message: expect.stringMatching(/under 16.*guardian/) });
    const visitor = await anonymousAgent(t.app);
    const held = await visitor.write(
      'post',
      '/api/public/holds',
      { salonSlug: slug, serviceId: rootColour, stylistId: ana.staffId, start: localIso(futureWeekday(2, 5), '13:00') },
      { 'X-Forwarded-For': '10.9.0.3' },
    );
    const claim = await c.write('post', `/api/me/holds/${held.body.holdId}/claim`, { secret: held.body.holdSecret });
    expect(claim.status).toBe(409);
    expect(claim.body.error.message).toMatch(/not booked online for anyone under 16/);

    expect(
      (await desk$.write('post', `/api/clients/${client.clientId!}/guardian-consents`, { guardianName: '', relationship: 'mother', note: '' })).status,
    ).toBe(400);
    const consent = await desk$.write('post', `/api/clients/${client.clientId!}/guardian-consents`, {
      guardianName: 'Ida Lund',
      relationship: 'mother',
      note: 'Signed form on file',
    });
    expect(consent.status).toBe(201);
    expect(consent.body.guardianConsents).toMatchObject([{ guardianName: 'Ida Lund', relationship: 'mother' }]);
    expect((await book(client.clientId!, rootColour, oxidative, start)).status).toBe(201);
    // A blow-dry needs no consent at any age.
    expect((await book(client.clientId!, blowDry, dryOnly, localIso(futureWeekday(2, 5), '16:00'))).status).toBe(201);
  });
});

describe('the other way out: change the steps', () => {
  it('a blocked booking changed to a direct dye keeps its start, needs no skin test, and gets its reminders back', async () => {
    const client = await clientWith([{ appliedDaysAgo: 20, result: 'negative' }]);
    await t.testDb.db
      .updateTable('clients')
      .set({ email: `change.${Date.now()}@example.test` })
      .where('id', '=', client.clientId!)
      .execute();
    const start = localIso(futureWeekday(6, 3), '10:00');
    const booked = await book(client.clientId!, rootColour, oxidative, start);
    expect(booked.status).toBe(201);
    const id = booked.body.id as string;
    await desk$.write('post', `/api/clients/${client.clientId!}/skin-tests`, {
      appliedAt: new Date(Date.now() - 3 * DAY).toISOString(),
      readAt: new Date(Date.now() - DAY).toISOString(),
      result: 'positive',
      product: '',
      notes: '',
    });
    expect((await desk$.get(`/api/bookings/${id}`)).body.skinTest.status).toBe('blocked');
    // Still oxidative: refused with the reason.
    expectRefused(await desk$.write('post', `/api/bookings/${id}/plan`, { stepPlan: oxidative }), /showed a reaction/);
    const direct: StepPlan = {
      sittings: [
        {
          steps: oxidative.sittings[0]!.steps.map((s) =>
            s.product === 'oxidative_colour' ? { ...s, product: 'direct_dye' as const, label: s.label.replace('colour', 'direct dye') } : s,
          ),
        },
      ],
    };
    const changed = await desk$.write('post', `/api/bookings/${id}/plan`, { stepPlan: direct });
    expect(changed.status).toBe(200);
    expect(changed.body.skinTest.status).toBe('not_needed');
    expect(Date.parse(changed.body.sittings[0].start)).toBe(Date.parse(start));
    expect(changed.body.sittings[0].steps[0].label).toBe('Apply direct dye to regrowth');
    const reminders = await t.testDb.db.selectFrom('messages').select('status').where('booking_id', '=', id).where('kind', 'like', 'reminder%').execute();
    expect(reminders.some((m) => m.status === 'queued')).toBe(true);
    // A plan with another number of sittings is refused naming the field.
    const two = await desk$.write('post', `/api/bookings/${id}/plan`, {
      stepPlan: { sittings: [direct.sittings[0], { ...direct.sittings[0], daysAfterPrevious: { min: 3, max: 14 } }] },
    });
    expect(two.status).toBe(400);
    expect(two.body.error.fields.stepPlan).toMatch(/Keep 1 sitting/);
  });
});
