import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { correctionPlan, insertNegativeSkinTest, insertPlannedService } from '../factories/service';
import { futureWeekday } from '../setup/dates';

let t: TestApp;
let salon: SalonFixture;
let client: UserFixture;
let other: UserFixture;
let serviceId: string;
let stylist$: Awaited<ReturnType<typeof signedInAgent>>;
let desk$: Awaited<ReturnType<typeof signedInAgent>>;
let client$: Awaited<ReturnType<typeof signedInAgent>>;
const tuesday = futureWeekday(2, 3);

const virgin = { natural: true, permanent: false, directDye: false, boxDye: false, henna: false, previousLightening: false };
const consultation = (over: object = {}) => ({
  currentLevel: 5,
  targetLevel: 6,
  history: virgin,
  length: 'medium',
  density: 'medium',
  elasticity: 'good',
  porosity: 'normal',
  conditionNotes: 'Healthy, normal stretch',
  strandTest: 'none',
  wantsCut: false,
  notes: '',
  ...over,
});

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db, { chairs: 2, basins: 1 });
  const stylist = await insertUser(db, salon.salonId, 'stylist', { skills: ['colour'] });
  const desk = await insertUser(db, salon.salonId, 'front_desk');
  client = await insertUser(db, salon.salonId, 'client');
  other = await insertUser(db, salon.salonId, 'client');
  serviceId = await insertPlannedService(db, salon.salonId, { needsSkinTest: true, depositCents: 4000, name: 'Colour correction' });
  await insertNegativeSkinTest(db, salon.salonId, client.clientId!);
  await db.updateTable('salons').set({ correction_cents_per_hour: 12000 }).where('id', '=', salon.salonId).execute();
  await db.insertInto('product_costs').values({ salon_id: salon.salonId, product_type: 'permanent', cents_per_gram: 5 }).execute();
  stylist$ = await signedInAgent(t.app, stylist.email, stylist.password);
  desk$ = await signedInAgent(t.app, desk.email, desk.password);
  client$ = await signedInAgent(t.app, client.email, client.password);
});
afterAll(() => t.close());

const list = async (clientId = client.clientId!) => (await stylist$.get(`/api/clients/${clientId}/consultations`)).body.consultations as { id: string }[];

describe('proposing a quote', () => {
  it("prices chair time at the salon's hourly rate plus product at cost, with the service's deposit", async () => {
    const res = await stylist$.write('post', '/api/consultations/propose', { consultation: consultation(), serviceId: null });
    expect(res.status).toBe(200);
    expect(res.body.serviceId).toBe(serviceId);
    expect(res.body.stepPlan.sittings).toHaveLength(1);
    // Apply colour 15 + develops up to 30 (45 min permanent colour limit − 15 applying) + rinse 15 + blow-dry 35
    // = 95 min at $120.00/h = $190.00; 60 g of permanent colour at 5 ¢/g = $3.00 (hand arithmetic).
    // Deposit: the service's $40.00.
    expect(res.body.lines).toEqual([
      { label: 'Colour work, 95 min at the hourly rate', cents: 19000 },
      { label: 'Product (estimate)', cents: 300 },
    ]);
    expect(res.body.priceCents).toBe(19300);
    expect(res.body.depositCents).toBe(4000);
  });

  it('refuses levels outside 1–10, naming each field', async () => {
    const res = await stylist$.write('post', '/api/consultations/propose', {
      consultation: consultation({ currentLevel: 0, targetLevel: 12 }),
      serviceId: null,
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['consultation.currentLevel', 'consultation.targetLevel']);
  });
});

describe('the service a quote books as', () => {
  // Lightening from level 1 to 10 on previously coloured hair, at most 2 levels a sitting (the salon's lift for
  // coloured hair, set below): ⌈9 / 2⌉ = 5 sittings (hand arithmetic).
  const longCorrection = consultation({
    currentLevel: 1,
    targetLevel: 10,
    history: { ...virgin, natural: false, permanent: true },
    strandTest: 'passed',
  });
  const sittingsOf = (n: number): StepPlan => ({
    sittings: Array.from({ length: n }, (_, i) => ({ ...(correctionPlan.sittings[i === 0 ? 0 : 1] as StepPlan['sittings'][number]) })),
  });

  it('files a five-sitting quote under a five-sitting service with its deposit, or, with none on the menu, carries the share of its own price', async () => {
    const db = t.testDb.db;
    const own = await insertSalon(db, { chairs: 2, basins: 1 });
    await db.updateTable('salons').set({ correction_cents_per_hour: 12000, lift_coloured_levels: 2 }).where('id', '=', own.salonId).execute();
    const stylist = await insertUser(db, own.salonId, 'stylist', { skills: ['colour'] });
    const as = await signedInAgent(t.app, stylist.email, stylist.password);
    // The menu's only colour service has two sittings: price $200.00, deposit $40.00 (20 % of its price).
    const twoSittings = await insertPlannedService(db, own.salonId, { depositCents: 4000, name: 'Correction (two sittings)' });

    const first = await as.write('post', '/api/consultations/propose', { consultation: longCorrection, serviceId: null });
    expect(first.status).toBe(200);
    expect(first.body.sittings).toBe(5);
    expect(first.body.serviceId).toBe(twoSittings);
    // Not the two-sitting service's $40.00: 20 % of this quote's price, as that service's deposit is of its own.
    expect(first.body.depositCents).toBe(Math.round(first.body.priceCents * 0.2));
    expect(first.body.warnings.map((w: { code: string }) => w.code)).toContain('no_fitting_service');

    // With a five-sitting colour service on the menu the quote books as that one, with its deposit.
    const fiveSittings = await insertPlannedService(db, own.salonId, { depositCents: 9000, name: 'Correction (five sittings)', plan: sittingsOf(5) });
    const second = await as.write('post', '/api/consultations/propose', { consultation: longCorrection, serviceId: null });
    expect(second.body.serviceId).toBe(fiveSittings);
    expect(second.body.depositCents).toBe(9000);
    expect(second.body.warnings.map((w: { code: string }) => w.code)).not.toContain('no_fitting_service');

    // A one-sitting quote still books as the nearest service that fits, with that service's own deposit.
    const short = await as.write('post', '/api/consultations/propose', { consultation: consultation(), serviceId: null });
    expect(short.body.serviceId).toBe(twoSittings);
    expect(short.body.depositCents).toBe(4000);
  });
});

describe('recording a consultation and its quote', () => {
  const quote = {
    serviceId: '',
    stepPlan: {
      sittings: [
        {
          steps: [
            { kind: 'hands_on', label: 'Apply colour', product: 'direct_dye', minutes: 40 },
            { kind: 'developing', label: 'Colour develops', product: 'direct_dye', minMinutes: 30, maxMinutes: 40 },
            { kind: 'basin', label: 'Rinse', product: 'none', minutes: 15 },
          ],
        },
      ],
    },
    priceCents: 26000,
    depositCents: 6000,
    notes: 'Edited: longer application',
  };

  it('stores nothing when the input is bad: level, deposit above price, another client’s photo', async () => {
    const bad = [
      { clientId: client.clientId, consultation: consultation({ targetLevel: 11 }), photoIds: [], quote: { ...quote, serviceId } },
      { clientId: client.clientId, consultation: consultation(), photoIds: [], quote: { ...quote, serviceId, depositCents: 30000 } },
    ];
    const levels = await stylist$.write('post', '/api/consultations', bad[0]);
    expect(levels.status).toBe(400);
    expect(levels.body.error.fields['consultation.targetLevel']).toMatch(/1–10/);
    const deposit = await stylist$.write('post', '/api/consultations', bad[1]);
    expect(deposit.body.error.fields['quote.depositCents']).toMatch(/more than the price/);
    const [photo] = await t.testDb.db
      .insertInto('client_photos')
      .values({
        salon_id: salon.salonId,
        client_id: other.clientId!,
        booking_id: null,
        kind: 'hair_now',
        storage_key: 'x/y.jpg',
        mime: 'image/jpeg',
        bytes: 10,
        width: 1,
        height: 1,
      })
      .returning('id')
      .execute();
    const photos = await stylist$.write('post', '/api/consultations', { ...bad[1], quote: { ...quote, serviceId }, photoIds: [photo!.id] });
    expect(photos.status).toBe(400);
    expect(photos.body.error.fields.photoIds).toMatch(/own photos/);
    expect(await list()).toEqual([]);
  });

  it('refuses a NUL byte or a lone surrogate in typed text, naming the field, never a 500', async () => {
    const res = await stylist$.write('post', '/api/consultations', {
      clientId: client.clientId,
      consultation: consultation({ conditionNotes: 'dry\u0000ends' }),
      photoIds: [],
      quote: { ...quote, serviceId, notes: 'half \ud800 pair', overrideReason: 'reason\u0000' },
    });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['consultation.conditionNotes', 'quote.notes', 'quote.overrideReason']);
    expect(await list()).toEqual([]);
  });

  it('saves the edited quote with the rules’ warnings; the desk books it with the quote’s plan, price and deposit', async () => {
    const coloured = consultation({ currentLevel: 4, targetLevel: 6, history: { ...virgin, natural: false, permanent: true } });
    const created = await stylist$.write('post', '/api/consultations', {
      clientId: client.clientId,
      consultation: coloured,
      photoIds: [],
      quote: { ...quote, serviceId },
    });
    expect(created.status).toBe(201);
    expect(created.body.quote).toMatchObject({ status: 'draft', priceCents: 26000, depositCents: 6000, notes: 'Edited: longer application' });
    // Lightening previously coloured hair with no strand test on record (common practice: strand test first).
    expect(created.body.quote.warnings.map((w: { code: string }) => w.code)).toContain('strand_test_missing');
    expect(await list()).toHaveLength(1);

    const edited = await stylist$.write('put', `/api/consultations/${created.body.id}/quote`, { ...quote, serviceId, depositCents: 99999 });
    expect(edited.status).toBe(400);
    expect(edited.body.error.fields.depositCents).toBeDefined();

    const options = await desk$.write('post', '/api/booking-options', {
      clientId: client.clientId,
      serviceId,
      stepPlan: created.body.quote.stepPlan,
      stylistId: null,
      earliestDate: tuesday,
    });
    expect(options.status).toBe(200);
    const option = options.body.options[0];
    const book = (over: object) =>
      desk$.write('post', '/api/bookings', {
        clientId: client.clientId,
        serviceId,
        stepPlan: created.body.quote.stepPlan,
        stylistId: option.stylistId,
        start: option.sittings[0].start,
        idempotencyKey: `quote-${Math.random()}`,
        ...over,
      });
    // Another client's booking cannot claim this quote.
    const wrong = await book({ clientId: other.clientId, quoteId: created.body.quote.id });
    expect(wrong.status).toBe(400);
    const booked = await book({ quoteId: created.body.quote.id });
    expect(booked.status).toBe(201);
    const booking = await t.testDb.db
      .selectFrom('bookings')
      .select(['quote_id', 'price_cents', 'deposit_cents'])
      .where('id', '=', booked.body.id)
      .executeTakeFirstOrThrow();
    expect(booking).toEqual({ quote_id: created.body.quote.id, price_cents: 26000, deposit_cents: 6000 });
    const view = await desk$.get(`/api/consultations/${created.body.id}`);
    expect(view.body.quote.bookingIds).toEqual([booked.body.id]);
  });
});

describe('sending and accepting a quote', () => {
  it('e-mails the summary (draft → sent), and only the signed-in client accepts it (sent → accepted)', async () => {
    const consultation = ((await list()) as { id: string; quote: { id: string } }[])[0]!;
    // A draft is not the client's to see or accept yet.
    expect((await client$.get('/api/me/quotes')).body.consultations).toEqual([]);
    expect((await client$.write('post', `/api/me/quotes/${consultation.quote.id}/accept`, {})).status).toBe(404);

    const sent = await stylist$.write('post', `/api/consultations/${consultation.id}/quote/send`, {});
    expect(sent.status).toBe(200);
    expect(sent.body.quote.status).toBe('sent');
    const mail = await vi.waitFor(() => {
      const found = t.smtp.messages.find((m) => m.to === client.email && /quote/i.test(m.subject));
      if (!found) throw new Error('no quote e-mail yet');
      return found;
    });
    expect(mail.text).toMatch(/Price: \$260\.00\. Deposit to book: \$60\.00\./);
    expect(mail.text).toMatch(/Sitting 1 of 1, up to 1 h 35 min: Apply colour, Colour develops, Rinse\./);
    expect(mail.text).toMatch(/skin test/);

    // Another client cannot accept it; the staff cannot use the client's route.
    const other$ = await signedInAgent(t.app, other.email, other.password);
    expect((await other$.write('post', `/api/me/quotes/${consultation.quote.id}/accept`, {})).status).toBe(404);
    expect((await desk$.write('post', `/api/me/quotes/${consultation.quote.id}/accept`, {})).status).toBe(403);

    const accepted = await client$.write('post', `/api/me/quotes/${consultation.quote.id}/accept`, {});
    expect(accepted.status).toBe(200);
    expect(accepted.body.quote.status).toBe('accepted');
    expect(accepted.body.quote.acceptedAt).not.toBeNull();
    expect((await client$.get('/api/me/quotes')).body.consultations[0].quote.status).toBe('accepted');
  });
});

describe('the strand test gates lightening', () => {
  let failed: UserFixture;
  const coloured = () => consultation({ currentLevel: 4, targetLevel: 8, history: { ...virgin, natural: false, permanent: true }, strandTest: 'passed' });
  // Lightener in two sections of 20 + 30 = 50 min on the hair each: within the salon's 50 min limit.
  const lightening = {
    sittings: [
      {
        steps: [
          { kind: 'hands_on', label: 'Apply lightener, section 1 of 2', product: 'lightener', minutes: 20 },
          { kind: 'developing', label: 'Lightener lifts, section 1 of 2', product: 'lightener', minMinutes: 20, maxMinutes: 30 },
          { kind: 'basin', label: 'Rinse section 1', product: 'none', minutes: 10 },
          { kind: 'hands_on', label: 'Apply lightener, section 2 of 2', product: 'lightener', minutes: 20 },
          { kind: 'developing', label: 'Lightener lifts, section 2 of 2', product: 'lightener', minMinutes: 20, maxMinutes: 30 },
          { kind: 'basin', label: 'Rinse section 2', product: 'none', minutes: 10 },
        ],
      },
    ],
  };
  const quote = (over: object = {}) => ({ serviceId, stepPlan: lightening, priceCents: 30000, depositCents: 5000, notes: '', ...over });

  beforeAll(async () => {
    failed = await insertUser(t.testDb.db, salon.salonId, 'client');
    const res = await stylist$.write('post', `/api/clients/${failed.clientId}/strand-tests`, {
      testedAt: new Date(Date.now() - 86_400_000).toISOString(),
      tested: 'Lightener 1:2 with 6 % on a nape strand',
      productType: 'lightener',
      developerPercent: 6,
      minutes: 30,
      result: 'failed',
      notes: 'Strand stretched and snapped',
      photoId: null,
    });
    expect(res.status).toBe(201);
  });

  it('the proposal plans no lightener and no remover, and says why, even when the consultation says passed', async () => {
    const res = await stylist$.write('post', '/api/consultations/propose', { consultation: coloured(), serviceId: null, clientId: failed.clientId });
    expect(res.status).toBe(200);
    expect(res.body.strandTest).toBe('failed');
    const products = res.body.stepPlan.sittings.flatMap((s: { steps: { product: string }[] }) => s.steps.map((st) => st.product));
    expect(products).not.toContain('lightener');
    expect(products).not.toContain('colour_remover');
    expect(res.body.warnings.find((w: { code: string }) => w.code === 'strand_test_failed').message).toMatch(/4 levels of lift asked for are left undone/);
  });

  it('refuses a quote with lightener after the failed test unless a reason is written, and keeps the reason', async () => {
    const body = (over: object) => ({ clientId: failed.clientId, consultation: coloured(), photoIds: [], quote: quote(over) });
    const refused = await stylist$.write('post', '/api/consultations', body({}));
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('STRAND_TEST');
    expect(refused.body.error.fields['quote.overrideReason']).toMatch(/strand test failed.*sitting 1, step 1 “Apply lightener, section 1 of 2”/);
    expect(await list(failed.clientId!)).toEqual([]);

    const reason = 'Re-tested after two bond treatments: the nape strand held at level 7.';
    const saved = await stylist$.write('post', '/api/consultations', body({ overrideReason: reason }));
    expect(saved.status).toBe(201);
    expect(saved.body.quote.overrideReason).toBe(reason);
    expect(saved.body.strandTest).toBe('failed');
    const audit = await t.testDb.db
      .selectFrom('audit_log')
      .select(['action', 'after'])
      .where('entity', '=', 'quote')
      .where('entity_id', '=', saved.body.quote.id)
      .execute();
    expect(audit).toEqual([{ action: 'lightening planned after a failed strand test', after: expect.objectContaining({ reason }) }]);

    // Editing it without the reason is refused too, naming the field; taking the lightener out needs none.
    const edit = await stylist$.write('put', `/api/consultations/${saved.body.id}/quote`, quote({ overrideReason: '' }));
    expect(edit.status).toBe(409);
    expect(edit.body.error.fields.overrideReason).toMatch(/write why/);
    const care = {
      sittings: [
        {
          steps: [
            { kind: 'basin', label: 'Bond treatment', product: 'bond_care', minutes: 15 },
            { kind: 'hands_on', label: 'Blow-dry', product: 'none', minutes: 35 },
          ],
        },
      ],
    };
    expect(
      (await stylist$.write('put', `/api/consultations/${saved.body.id}/quote`, quote({ stepPlan: care, priceCents: 9000, depositCents: 0 }))).status,
    ).toBe(200);
  });

  it('refuses a quote whose developing step is over its family’s limit, naming the step', async () => {
    // 45 min applying + up to 50 lifting = 95 min of lightener on the hair, over the 50 min limit.
    const tooLong = {
      sittings: [
        {
          steps: [
            { kind: 'hands_on', label: 'Apply lightener', product: 'lightener', minutes: 45 },
            { kind: 'developing', label: 'Lightener lifts', product: 'lightener', minMinutes: 30, maxMinutes: 50 },
            { kind: 'basin', label: 'Rinse', product: 'none', minutes: 15 },
          ],
        },
      ],
    };
    const res = await stylist$.write('post', '/api/consultations', {
      clientId: client.clientId,
      consultation: consultation(),
      photoIds: [],
      quote: quote({ stepPlan: tooLong }),
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields['quote.stepPlan.sittings.0.steps.1']).toMatch(
      /“Lightener lifts”: lightener may be on the hair at most 50 min; this plan keeps it on up to 95 min/,
    );
  });

  it('refuses to propose, with the reason, when the salon’s limit leaves no room even in four sections', async () => {
    const db = t.testDb.db;
    await db.updateTable('salons').set({ lightener_max_minutes: 25 }).where('id', '=', salon.salonId).execute();
    try {
      // 40 min of lightener applying in 4 sections = 10 min, + 20 min least lifting = 30 min > 25.
      const res = await stylist$.write('post', '/api/consultations/propose', { consultation: coloured(), serviceId: null, clientId: client.clientId });
      expect(res.status).toBe(409);
      expect(res.body.error.message).toMatch(/limit of 25 min on the hair/);
    } finally {
      await db.updateTable('salons').set({ lightener_max_minutes: 50 }).where('id', '=', salon.salonId).execute();
    }
  });
});
