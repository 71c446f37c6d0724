import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestDb, type TestDb } from '../setup/test-db';
import { loadDemoSalon } from '@server/demo/load-demo-salon';
import { findSalon } from '@server/features/salon/salon.repository';
import { quotePriceInputs } from '@server/features/consultations/consultations.repository';
import { proposeQuote } from '@shared/quotes/propose-quote';
import { processingLimitIssues } from '@shared/rules/processing-limits';
import { StepPlanSchema, sittingMaxMinutes, type StepPlan } from '@shared/schemas/step-plan.schemas';
import type { ConsultationInput } from '@shared/schemas/consultation.schemas';

// The demo salon's colour correction, loaded as `npm start` loads it.
let testDb: TestDb;
let salonId: string;
beforeAll(async () => {
  testDb = await createTestDb();
  await loadDemoSalon(testDb.db, new Date());
  salonId = (await testDb.db.selectFrom('salons').select('id').executeTakeFirstOrThrow()).id;
});
afterAll(() => testDb.drop());

// The default limits, typed by hand (common practice, from memory): lightener 50 min, permanent colour 45,
// toner 30, remover 60 per application.
const limits = { lightener: 50, oxidative_colour: 45, toner_oxidative: 30, colour_remover: 60 };

describe('the demo correction', () => {
  it('is the real job: about ten hours over two sittings 3–14 days apart, every step within the limits', async () => {
    const row = await testDb.db
      .selectFrom('services')
      .select('step_plan')
      .where('salon_id', '=', salonId)
      .where('name', '=', 'Colour correction (two sittings)')
      .executeTakeFirstOrThrow();
    const plan = StepPlanSchema.parse(row.step_plan);
    const labels = plan.sittings.map((s) => s.steps.map((st) => st.label));
    expect(labels[0]).toEqual(
      expect.arrayContaining([
        'Check-in and strand check',
        'Apply colour remover, round 1 of 2',
        'Apply colour remover, round 2 of 2',
        'Apply toner',
        'Blow-dry',
      ]),
    );
    expect(plan.sittings[0]!.steps.filter((s) => s.kind === 'developing' && s.product === 'colour_remover' && s.heat)).toHaveLength(2);
    expect(plan.sittings[0]!.steps.some((s) => s.product === 'lightener')).toBe(true);
    expect(labels[1]).toEqual(expect.arrayContaining(['Apply vivid colour, section 1 of 3', 'Apply vivid colour, section 3 of 3', 'Cut and finish']));
    // docs/quotes.md: sittings of a correction 3–14 days apart.
    expect(plan.sittings[1]!.daysAfterPrevious).toEqual({ min: 3, max: 14 });
    // Sitting 1 at the most: 30 + (20 + 10 + 20) × 2 + 20 + (25 + 25 + 10) + (25 + 25 + 20) + (20 + 10 + 10) + 45 = 365 min;
    // sitting 2: 15 + 25 × 3 + 35 + 15 + 75 = 215 min. 580 min = 9 h 40 min, about ten hours.
    expect(sittingMaxMinutes(plan)).toEqual([365, 215]);
    expect(processingLimitIssues(plan, limits)).toEqual([]);
  });

  it('every demo service and booking fits the default limits, and the booked sittings are 3 to 14 days apart', async () => {
    for (const s of await testDb.db.selectFrom('services').select(['name', 'step_plan']).where('salon_id', '=', salonId).execute()) {
      expect(processingLimitIssues(s.step_plan as StepPlan, limits), s.name).toEqual([]);
    }
    for (const b of await testDb.db.selectFrom('bookings').select(['id', 'step_plan']).where('salon_id', '=', salonId).execute()) {
      expect(processingLimitIssues(b.step_plan as StepPlan, limits), b.id).toEqual([]);
    }
    const client = await testDb.db
      .selectFrom('clients')
      .select('id')
      .where('salon_id', '=', salonId)
      .where('email', '=', 'client@demo.test')
      .executeTakeFirstOrThrow();
    const sittings = await testDb.db
      .selectFrom('sittings as s')
      .innerJoin('bookings as b', 'b.id', 's.booking_id')
      .select(['s.seq', sql<Date>`lower(s.during)`.as('starts_at')])
      .where('b.client_id', '=', client.id)
      .orderBy('s.seq')
      .execute();
    expect(sittings).toHaveLength(2);
    const days = (sittings[1]!.starts_at.getTime() - sittings[0]!.starts_at.getTime()) / 86_400_000;
    expect(days).toBeGreaterThanOrEqual(3);
    expect(days).toBeLessThanOrEqual(14);
  });

  it('the demo quote is what the quote rules propose for the recorded consultation at the demo salon’s rules', async () => {
    const row = await testDb.db
      .selectFrom('quotes as q')
      .innerJoin('consultations as c', 'c.id', 'q.consultation_id')
      .select(['c.details', 'q.step_plan', 'q.price_cents', 'q.deposit_cents'])
      .where('q.salon_id', '=', salonId)
      .executeTakeFirstOrThrow();
    const salon = await findSalon(testDb.db, salonId);
    const expected = proposeQuote(
      { ...(row.details as ConsultationInput), strandTest: 'passed' },
      { ...(await quotePriceInputs(testDb.db, salonId)), deposit: { kind: 'fixed', cents: row.deposit_cents } },
      { processingLimits: salon.processingLimits, liftPerSitting: salon.liftPerSitting },
    );
    expect(row.step_plan).toEqual(expected.stepPlan);
    expect(row.price_cents).toBe(expected.priceCents);
    // Box dye over permanent, 4 → 8 with a vivid shade: remover twice under heat in sitting 1, the vivid in sections in sitting 2.
    const plan = row.step_plan as StepPlan;
    expect(plan.sittings).toHaveLength(2);
    expect(plan.sittings[0]!.steps.filter((s) => s.kind === 'developing' && s.product === 'colour_remover' && s.heat)).toHaveLength(2);
    expect(plan.sittings[1]!.steps.filter((s) => s.kind === 'hands_on' && s.product === 'direct_dye').length).toBeGreaterThan(1);
  });
});
