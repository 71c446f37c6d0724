import { describe, expect, it } from 'vitest';
import { ConsultationInputSchema, type ConsultationInput } from '../schemas/consultation.schemas';
import { StepPlanSchema, sittingMaxMinutes } from '../schemas/step-plan.schemas';
import { DAYS_BETWEEN_SITTINGS, depositFor, levelsPerSitting, proposeQuote, type QuotePricing } from './propose-quote';

const virgin = { natural: true, permanent: false, directDye: false, boxDye: false, henna: false, previousLightening: false };
const base: ConsultationInput = {
  currentLevel: 5, targetLevel: 5, history: virgin, length: 'medium', density: 'medium', elasticity: 'good', porosity: 'normal',
  conditionNotes: '', strandTest: 'none', wantsCut: false, notes: '',
};
const pricing: QuotePricing = { correctionCentsPerHour: 9000, cutFinishCents: 7500, productCentsPerGram: {}, deposit: { kind: 'percent', percent: 25 } };
const labels = (q: ReturnType<typeof proposeQuote>) => q.stepPlan.sittings.map((s) => s.steps.map((st) => st.label));
const codes = (q: ReturnType<typeof proposeQuote>) => q.warnings.map((w) => w.code);

describe('step plan', () => {
  it('is always a step plan the booking engine accepts', () => {
    for (const currentLevel of [1, 4, 7, 10]) {
      for (const targetLevel of [1, 5, 10]) {
        for (const length of ['short', 'extra_long'] as const) {
          const q = proposeQuote({ ...base, currentLevel, targetLevel, length, density: 'thick', history: { ...virgin, boxDye: true } }, pricing);
          expect(StepPlanSchema.safeParse(q.stepPlan).success).toBe(true);
        }
      }
    }
  });

  it('a small lift on natural hair is one colour sitting without lightener', () => {
    // Common practice: permanent colour with 20–30 vol lifts natural hair by up to about 2 levels (trade-facts §4).
    const q = proposeQuote({ ...base, currentLevel: 5, targetLevel: 7 }, pricing);
    expect(labels(q)).toEqual([['Apply colour', 'Colour develops', 'Rinse and condition', 'Blow-dry']]);
    expect(q.sittings).toBe(1);
    expect(q.daysApart).toBeNull();
  });

  it('previously coloured hair going lighter gets removal, lightening, toning, and the cut at the end', () => {
    const q = proposeQuote({ ...base, currentLevel: 4, targetLevel: 6, history: { ...virgin, natural: false, permanent: true }, wantsCut: true }, pricing);
    expect(labels(q)).toEqual([
      ['Apply colour remover', 'Remover processes', 'Rinse remover', 'Apply lightener', 'Lightener lifts', 'Rinse lightener', 'Apply toner', 'Toner develops', 'Rinse toner', 'Cut and finish'],
    ]);
  });

  it('splits a big lift across sittings: about 3 levels a sitting on virgin hair, 2 on coloured hair (common practice)', () => {
    // Common practice (trade-facts §4, from memory): lift per sitting about 3–4 levels on virgin hair, about 2 on
    // coloured or lightened hair; larger changes are split across sittings 2–6 weeks apart.
    const virginLift = proposeQuote({ ...base, currentLevel: 3, targetLevel: 9 }, pricing); // 6 levels / 3 = 2 sittings
    expect(virginLift.sittings).toBe(2);
    const coloured = proposeQuote({ ...base, currentLevel: 3, targetLevel: 9, history: { ...virgin, previousLightening: true } }, pricing); // 6 / 2 = 3
    expect(coloured.sittings).toBe(3);
    expect(coloured.daysApart).toEqual({ min: 14, max: 42 });
    expect(coloured.stepPlan.sittings[1].daysAfterPrevious).toEqual(DAYS_BETWEEN_SITTINGS);
    expect(codes(coloured)).toContain('split');
  });

  it('plans fewer levels a sitting on compromised hair', () => {
    const coloured = { ...base, history: { ...virgin, previousLightening: true } };
    expect(levelsPerSitting(coloured)).toBe(2);
    expect(levelsPerSitting({ ...coloured, elasticity: 'poor' })).toBe(1);
    expect(levelsPerSitting({ ...coloured, elasticity: 'poor', strandTest: 'fragile' })).toBe(1); // never below one
  });

  it('fills lightened hair before going 3 or more levels darker (common practice)', () => {
    const q = proposeQuote({ ...base, currentLevel: 9, targetLevel: 5, history: { ...virgin, previousLightening: true } }, pricing);
    expect(labels(q)[0]).toContain('Apply filler (pre-pigment)');
    const twoDarker = proposeQuote({ ...base, currentLevel: 9, targetLevel: 7, history: { ...virgin, previousLightening: true } }, pricing);
    expect(labels(twoDarker)[0]).not.toContain('Apply filler (pre-pigment)');
  });
});

describe('minutes for length and density', () => {
  it('scales hands-on and rinse minutes, never the processing time (common practice: longer, thicker hair takes more time)', () => {
    const medium = proposeQuote({ ...base, currentLevel: 5, targetLevel: 6 }, pricing).stepPlan.sittings[0].steps;
    const long = proposeQuote({ ...base, currentLevel: 5, targetLevel: 6, length: 'long', density: 'thick' }, pricing).stepPlan.sittings[0].steps;
    // Apply colour: 30 min × 1.35 (long) × 1.25 (thick) = 50.6 → 50 on the 5-minute grid.
    expect(medium[0]).toMatchObject({ kind: 'hands_on', minutes: 30 });
    expect(long[0]).toMatchObject({ kind: 'hands_on', minutes: 50 });
    // Rinse follows length only: 15 × 1.35 = 20.25 → 20.
    expect(long[2]).toMatchObject({ kind: 'basin', minutes: 20 });
    expect(long[1]).toEqual(medium[1]);
    expect(sittingMaxMinutes({ sittings: [{ steps: long }] })[0]).toBeGreaterThan(sittingMaxMinutes({ sittings: [{ steps: medium }] })[0]);
  });
});

describe('price and deposit', () => {
  it('bills chair time at the hourly rate, the cut at its price, and product at cost per gram', () => {
    const q = proposeQuote({ ...base, currentLevel: 5, targetLevel: 6, wantsCut: true }, { ...pricing, productCentsPerGram: { permanent: 5 } });
    // Chair time without the cut: 30 + 45 (most) + 15 = 90 min; 90/60 × $90.00 = $135.00.
    // Permanent colour 60 g × 5 ¢ = $3.00; cut and finish $75.00. Total $213.00.
    expect(q.lines).toEqual([
      { label: 'Colour work, 90 min at the hourly rate', cents: 13500 },
      { label: 'Cut and finish', cents: 7500 },
      { label: 'Product (estimate)', cents: 300 },
    ]);
    expect(q.productGrams).toEqual({ permanent: 60 });
    expect(q.priceCents).toBe(21300);
    // 25 % of $213.00 = $53.25.
    expect(q.depositCents).toBe(5325);
  });

  it('uses more product on longer, thicker hair', () => {
    const q = proposeQuote({ ...base, currentLevel: 5, targetLevel: 6, length: 'extra_long', density: 'thick' }, pricing);
    // 60 g × 1.7 × 1.25 = 127.5 → 128 g.
    expect(q.productGrams.permanent).toBe(128);
  });

  it('takes the deposit policy as a parameter: fixed or percent, never above the price', () => {
    expect(depositFor({ kind: 'fixed', cents: 17000 }, 68000)).toBe(17000);
    expect(depositFor({ kind: 'fixed', cents: 17000 }, 10000)).toBe(10000);
    expect(depositFor({ kind: 'percent', percent: 50 }, 68000)).toBe(34000);
  });
});

describe('warnings', () => {
  it('warns when lightening previously coloured hair has no strand test (common practice), not once one passed', () => {
    const c = { ...base, currentLevel: 4, targetLevel: 6, history: { ...virgin, permanent: true } };
    expect(codes(proposeQuote(c, pricing))).toContain('strand_test_missing');
    expect(codes(proposeQuote({ ...c, strandTest: 'passed' }, pricing))).not.toContain('strand_test_missing');
    expect(codes(proposeQuote({ ...c, strandTest: 'failed' }, pricing))).toContain('strand_test_failed');
  });

  it('warns about henna, box dye, direct dye and compromised condition', () => {
    const q = proposeQuote(
      { ...base, currentLevel: 4, targetLevel: 6, history: { ...virgin, henna: true, boxDye: true, directDye: true }, porosity: 'high' },
      pricing,
    );
    expect(codes(q)).toEqual(expect.arrayContaining(['henna', 'box_dye', 'direct_dye', 'compromised', 'strand_test_missing']));
  });

  it('shows the cautions: skin test, gloves and ventilation, breakage, professional judgement', () => {
    const text = proposeQuote(base, pricing).cautions.join(' ');
    expect(text).toMatch(/skin test/i);
    expect(text).toMatch(/gloves/i);
    expect(text).toMatch(/ventilation/i);
    expect(text).toMatch(/breakage/i);
    expect(text).toMatch(/judgement and local regulations/i);
  });
});

describe('consultation input', () => {
  it('refuses levels outside the 1–10 scale, naming the field', () => {
    const r = ConsultationInputSchema.safeParse({ ...base, currentLevel: 0, targetLevel: 11 });
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.path.join('.'))).toEqual(['currentLevel', 'targetLevel']);
  });
});
