import { describe, expect, it } from 'vitest';
import { ConsultationInputSchema, type ConsultationInput } from '../schemas/consultation.schemas';
import { StepPlanSchema, sittingMaxMinutes, type PlannedStep } from '../schemas/step-plan.schemas';
import { processingLimitIssues } from '../rules/processing-limits';
import { levelsPerSitting } from './lift-per-sitting';
import { depositFor, proposeQuote, type PlanningRules, type QuotePricing } from './propose-quote';
import { ProposalRefused } from './stage-steps';

const virgin = { natural: true, permanent: false, directDye: false, boxDye: false, henna: false, previousLightening: false };
const base: ConsultationInput = {
  currentLevel: 5,
  targetLevel: 5,
  history: virgin,
  length: 'medium',
  density: 'medium',
  elasticity: 'good',
  porosity: 'normal',
  conditionNotes: '',
  strandTest: 'none',
  wantsCut: false,
  vivid: false,
  notes: '',
};
const pricing: QuotePricing = {
  correctionCentsPerHour: 9000,
  cutFinishCents: 7500,
  productCentsPerGram: {},
  deposit: { kind: 'percent', percent: 25 },
  currency: 'USD',
};
// The salon's rules, typed here by hand from the trade's rules of thumb (common practice, from memory): lightener
// on the head about 45–50 min at most, permanent colour 30–45, demi-permanent and toner up to 30, remover up to
// 60 per application; lift per sitting about 3 levels on virgin hair, 2 on coloured, 1 on compromised hair.
const rules: PlanningRules = {
  processingLimits: { lightener: 50, oxidative_colour: 45, toner_oxidative: 30, colour_remover: 60 },
  liftPerSitting: { virgin: 3, coloured: 2, compromised: 1 },
};
const propose = (c: Partial<ConsultationInput>, r: PlanningRules = rules) => proposeQuote({ ...base, ...c }, pricing, r);
const labels = (q: ReturnType<typeof proposeQuote>) => q.stepPlan.sittings.map((s) => s.steps.map((st) => st.label));
const codes = (q: ReturnType<typeof proposeQuote>) => q.warnings.map((w) => w.code);
const coloured = { ...virgin, natural: false, permanent: true };
const minutesOf = (s: PlannedStep) => (s.kind === 'developing' ? [s.minMinutes, s.maxMinutes] : s.minutes);

describe('step plan', () => {
  it('is always a step plan the booking engine accepts, within the salon’s processing limits', () => {
    for (const currentLevel of [1, 4, 7, 10]) {
      for (const targetLevel of [1, 5, 10]) {
        for (const length of ['short', 'extra_long'] as const) {
          for (const strandTest of ['none', 'fragile', 'failed'] as const) {
            const q = propose({
              currentLevel,
              targetLevel,
              length,
              density: 'thick',
              strandTest,
              vivid: targetLevel === 10,
              history: { ...virgin, boxDye: true },
            });
            expect(StepPlanSchema.safeParse(q.stepPlan).success).toBe(true);
            expect(processingLimitIssues(q.stepPlan, rules.processingLimits)).toEqual([]);
          }
        }
      }
    }
  });

  it('a small lift on natural hair is one colour sitting without lightener, developing only as long as the limit leaves', () => {
    // Common practice: permanent colour with 20–30 vol lifts natural hair by up to about 2 levels (from memory).
    const q = propose({ currentLevel: 5, targetLevel: 7 });
    expect(labels(q)).toEqual([['Apply colour', 'Colour develops', 'Rinse and condition', 'Blow-dry']]);
    // Contact time counts from the first brushful: 45 min permanent colour − 15 min applying = 30 min most,
    // and the last section applied still needs the least 30 min (common practice 30–45).
    expect(q.stepPlan.sittings[0]?.steps.map(minutesOf)).toEqual([15, [30, 30], 15, 35]);
    expect(q.sittings).toBe(1);
    expect(q.daysApart).toBeNull();
  });

  it('previously coloured hair going lighter: strand check, remover under heat, lightener in two sections, toner, cut at the end', () => {
    const q = propose({ currentLevel: 4, targetLevel: 6, history: coloured, wantsCut: true });
    expect(labels(q)).toEqual([
      [
        'Check-in and strand check',
        'Apply colour remover',
        'Remover processes under heat',
        'Rinse remover thoroughly',
        'Apply lightener, section 1 of 2',
        'Lightener lifts, section 1 of 2',
        'Rinse lightener, section 1 of 2',
        'Apply lightener, section 2 of 2',
        'Lightener lifts, section 2 of 2',
        'Rinse lightener, section 2 of 2',
        'Apply toner',
        'Toner develops',
        'Rinse toner',
        'Cut and finish',
      ],
    ]);
    const steps = q.stepPlan.sittings[0]!.steps;
    // Remover with heat: 60 min × ½ (heat roughly halves processing, common practice) = 30 min on the hair;
    // 15 min applying leaves 15 min; processing 20–40 min halved by heat = 10–20, so 10–15.
    expect(steps[2]).toMatchObject({ kind: 'developing', product: 'colour_remover', heat: true, minMinutes: 10, maxMinutes: 15 });
    // Lightener: 40 min applying + 20 min least = 60 > 50, so two sections of 20 min; each may lift 50 − 20 = 30 min.
    expect(steps.slice(4, 10).map(minutesOf)).toEqual([20, [20, 30], 10, 20, [20, 30], 10]);
    expect(codes(q)).toContain('sections');
  });

  it('splits a big lift across sittings a few days apart: 3 levels a sitting on virgin hair, 2 on coloured hair (the salon’s rules)', () => {
    // Common practice (from memory): about 3–4 levels a sitting on virgin hair, about 2 on coloured hair.
    expect(propose({ currentLevel: 3, targetLevel: 9 }).sittings).toBe(2); // 6 levels / 3 = 2 sittings
    const q = propose({ currentLevel: 3, targetLevel: 9, history: { ...virgin, previousLightening: true } }); // 6 / 2 = 3
    expect(q.sittings).toBe(3);
    // docs/quotes.md: a correction continues 3–14 days later (common practice, from memory).
    expect(q.daysApart).toEqual({ min: 3, max: 14 });
    expect(q.stepPlan.sittings[1]?.daysAfterPrevious).toEqual({ min: 3, max: 14 });
    expect(codes(q)).toContain('split');
    // A salon that lifts virgin hair 2 levels a sitting: 6 / 2 = 3 sittings.
    expect(propose({ currentLevel: 3, targetLevel: 9 }, { ...rules, liftPerSitting: { virgin: 2, coloured: 2, compromised: 1 } }).sittings).toBe(3);
  });

  it('says plainly what the sitting cap leaves undone, never lifting more a sitting', () => {
    // Compromised hair, 1 level a sitting: 1 → 10 needs 9 sittings; the plan stops at 6, which reach 1 + 6 = 7.
    const q = propose({ currentLevel: 1, targetLevel: 10, history: coloured, elasticity: 'poor' });
    expect(q.sittings).toBe(6);
    const left = q.warnings.find((w) => w.code === 'lift_left');
    expect(left?.message).toMatch(/reach level 7, not 10: the last 3 levels are left undone/);
  });

  it('plans fewer levels a sitting on compromised hair and after a fragile strand test, never below one', () => {
    const c = (over: Partial<ConsultationInput>) => ({ ...base, history: { ...virgin, previousLightening: true }, ...over });
    const lift = rules.liftPerSitting;
    expect(levelsPerSitting(c({}), lift)).toBe(2);
    expect(levelsPerSitting(c({ elasticity: 'poor' }), lift)).toBe(1);
    expect(levelsPerSitting(c({ strandTest: 'fragile' }), lift)).toBe(1); // 2 − 1
    expect(levelsPerSitting(c({ elasticity: 'poor', strandTest: 'fragile' }), lift)).toBe(1); // never below one
    expect(levelsPerSitting({ ...base, strandTest: 'fragile' }, lift)).toBe(2); // virgin 3 − 1
  });

  it('fills lightened hair before going 3 or more levels darker, rinsing the filler before the colour (common practice)', () => {
    const q = propose({ currentLevel: 9, targetLevel: 5, history: { ...virgin, previousLightening: true } });
    expect(labels(q)[0]?.slice(0, 4)).toEqual(['Apply filler (pre-pigment)', 'Filler develops', 'Rinse filler', 'Apply colour']);
    const twoDarker = propose({ currentLevel: 9, targetLevel: 7, history: { ...virgin, previousLightening: true } });
    expect(labels(twoDarker)[0]).not.toContain('Apply filler (pre-pigment)');
  });
});

describe('the strand test gates lightening', () => {
  it('a failed strand test gives no lightener and no remover, a care sitting, and says why', () => {
    const q = propose({ currentLevel: 4, targetLevel: 8, history: coloured, strandTest: 'failed' });
    const products = q.stepPlan.sittings.flatMap((s) => s.steps.map((st) => st.product));
    expect(products).not.toContain('lightener');
    expect(products).not.toContain('colour_remover');
    expect(labels(q)).toEqual([['Bond treatment', 'Blow-dry']]);
    const failed = q.warnings.find((w) => w.code === 'strand_test_failed');
    expect(failed?.message).toMatch(/no lightener and no colour remover are planned, so the 4 levels of lift asked for are left undone/);
    expect(failed?.message).toMatch(/write the reason on the quote/);
  });

  it('a fragile strand lowers the lift per sitting and adds a bond-care step after the lightener', () => {
    // Coloured hair lifts 2 a sitting; fragile takes one off: 4 → 6 is 2 levels at 1 a sitting = 2 sittings.
    const q = propose({ currentLevel: 4, targetLevel: 6, history: { ...virgin, previousLightening: true }, strandTest: 'fragile' });
    expect(q.sittings).toBe(2);
    for (const sitting of q.stepPlan.sittings) {
      const care = sitting.steps.findIndex((s) => s.product === 'bond_care');
      expect(sitting.steps[care]).toMatchObject({ kind: 'basin', label: 'Bond treatment' });
      expect(sitting.steps[care - 1]?.label).toBe('Rinse lightener, section 2 of 2');
    }
    expect(codes(q)).toEqual(expect.arrayContaining(['fragile', 'split']));
  });
});

describe('processing limits', () => {
  it('splits a long application into sections so application + most developing stays within the limit', () => {
    // Long, thick, virgin hair lifting 3 levels: lightener application 40 × 1.35 × 1.25 = 67.5 → 70 min.
    // 70 + 20 (least) = 90 > 50; halves: 35 + 20 = 55 > 50; thirds: 23.3 → 25 + 20 = 45 ≤ 50 → 3 sections.
    // Each section may lift 50 − 25 = 25 min; the rinse 15 × 1.35 = 20.25 → 20, a third each → 5.
    const q = propose({ currentLevel: 3, targetLevel: 6, length: 'long', density: 'thick' });
    const steps = q.stepPlan.sittings[0]!.steps.filter(
      (s) => s.label.startsWith('Apply lightener') || s.label.startsWith('Lightener') || s.label.startsWith('Rinse lightener'),
    );
    expect(steps.map((s) => s.label)).toEqual([
      'Apply lightener, section 1 of 3',
      'Lightener lifts, section 1 of 3',
      'Rinse lightener, section 1 of 3',
      'Apply lightener, section 2 of 3',
      'Lightener lifts, section 2 of 3',
      'Rinse lightener, section 2 of 3',
      'Apply lightener, section 3 of 3',
      'Lightener lifts, section 3 of 3',
      'Rinse lightener, section 3 of 3',
    ]);
    expect(steps.slice(0, 3).map(minutesOf)).toEqual([25, [20, 25], 5]);
  });

  it('refuses with the reason when even four sections cannot fit the salon’s limit', () => {
    // A salon limit of 25 min for lightener: 40 min applying in 4 sections is 10 + 20 (least) = 30 > 25.
    const strict = { ...rules, processingLimits: { ...rules.processingLimits, lightener: 25 } };
    expect(() => propose({ currentLevel: 3, targetLevel: 7, history: coloured }, strict)).toThrow(ProposalRefused);
    expect(() => propose({ currentLevel: 3, targetLevel: 7, history: coloured }, strict)).toThrow(
      /limit of 25 min.*4 sections, applying 10 min and processing at least 20 min keeps it on 30 min/,
    );
  });
});

describe('a real correction: box dye over permanent, level 4 to 8 with a vivid shade, long hair', () => {
  it('two sittings a few days apart: remover twice under heat, lightener, toner; then lightener, the vivid shade in sections, the cut', () => {
    const q = propose({
      currentLevel: 4,
      targetLevel: 8,
      history: { ...coloured, boxDye: true },
      length: 'long',
      strandTest: 'passed',
      wantsCut: true,
      vivid: true,
    });
    expect(q.sittings).toBe(2); // 4 levels at 2 a sitting on coloured hair
    const [one, two] = q.stepPlan.sittings;
    const remover = one!.steps.filter((s) => s.kind === 'developing' && s.product === 'colour_remover');
    // Two remover cycles for box dye (common practice), each 20 min applying (15 × 1.35 = 20.25 → 20) and 10 min
    // under heat: 60 × ½ = 30 min on the hair − 20 = 10.
    expect(remover).toEqual([
      { kind: 'developing', label: 'Remover processes under heat, round 1 of 2', product: 'colour_remover', minMinutes: 10, maxMinutes: 10, heat: true },
      { kind: 'developing', label: 'Remover processes under heat, round 2 of 2', product: 'colour_remover', minMinutes: 10, maxMinutes: 10, heat: true },
    ]);
    expect(one?.steps.map((s) => s.label)).toContain('Apply toner');
    expect(two?.steps.filter((s) => s.product === 'direct_dye').map((s) => s.label)).toEqual([
      'Apply vivid colour, section 1 of 3',
      'Apply vivid colour, section 2 of 3',
      'Apply vivid colour, section 3 of 3',
      'Vivid colour develops',
    ]);
    expect(two?.steps.at(-1)?.label).toBe('Cut and finish');
    // Sitting 1 at the most: strand check 20 + remover (20 + 10 + 20) × 2 = 100 + lightener (30 + 20 + 10) × 2 = 120
    // + toner 15 + 15 + 15 = 45 + blow-dry 45 = 330 min. Sitting 2: lightener 120 + vivid 3 × 20 + 30 + 20 = 110
    // + cut 80 = 310 min: 640 min, 10 h 40 min in all.
    expect(sittingMaxMinutes(q.stepPlan)).toEqual([330, 310]);
    // Billed without the cut: 330 + 310 − 80 = 560 min at $90.00 an hour = $840.00.
    expect(q.lines[0]).toEqual({ label: 'Colour work, 560 min at the hourly rate', cents: 84000 });
    expect(q.daysApart).toEqual({ min: 3, max: 14 });
  });
});

describe('minutes for length and density', () => {
  it('scales hands-on and rinse minutes, never the processing time (common practice: longer, thicker hair takes more time)', () => {
    const medium = propose({ currentLevel: 5, targetLevel: 6 }).stepPlan.sittings[0]!.steps;
    const long = propose({ currentLevel: 5, targetLevel: 6, length: 'long', density: 'thick' }).stepPlan.sittings[0]!.steps;
    // Apply colour: 15 min × 1.35 (long) × 1.25 (thick) = 25.3 → 25; 25 + 30 (least) > 45, so two sections of 12.5 → 15.
    // Rinse follows length only: 15 × 1.35 = 20.25 → 20, half each → 10. Processing stays 30 min as on medium hair.
    expect(medium.map(minutesOf)).toEqual([15, [30, 30], 15, 35]);
    expect(long.map(minutesOf)).toEqual([15, [30, 30], 10, 15, [30, 30], 10, 60]);
  });
});

describe('price and deposit', () => {
  it('rounds the price up to the whole unit of the salon’s currency', () => {
    const at = (currency: string) =>
      proposeQuote({ ...base, currentLevel: 5, targetLevel: 6 }, { ...pricing, productCentsPerGram: { permanent: 5.3 }, currency }, rules);
    const sum = at('USD').lines.reduce((t, l) => t + l.cents, 0);
    // ISO 4217: USD has 2 decimals (100 cents to the dollar), JPY none (the yen is its own minor unit), KWD 3.
    expect(at('USD').priceCents).toBe(Math.ceil(sum / 100) * 100);
    expect(at('JPY').priceCents).toBe(Math.ceil(sum));
    expect(at('KWD').priceCents).toBe(Math.ceil(sum / 1000) * 1000);
  });
  it('bills chair time at the hourly rate, the cut at its price, and product at cost per gram', () => {
    const q = proposeQuote({ ...base, currentLevel: 5, targetLevel: 6, wantsCut: true }, { ...pricing, productCentsPerGram: { permanent: 5 } }, rules);
    // Chair time without the cut: 15 + 30 (most) + 15 = 60 min; 60/60 × $90.00 = $90.00.
    // Permanent colour 60 g × 5 ¢ = $3.00; cut and finish $75.00. Total $168.00.
    expect(q.lines).toEqual([
      { label: 'Colour work, 60 min at the hourly rate', cents: 9000 },
      { label: 'Cut and finish', cents: 7500 },
      { label: 'Product (estimate)', cents: 300 },
    ]);
    expect(q.productGrams).toEqual({ permanent: 60 });
    expect(q.priceCents).toBe(16800);
    // 25 % of $168.00 = $42.00.
    expect(q.depositCents).toBe(4200);
  });

  it('uses more product on longer, thicker hair', () => {
    const q = propose({ currentLevel: 5, targetLevel: 6, length: 'extra_long', density: 'thick' });
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
    const c = { currentLevel: 4, targetLevel: 6, history: coloured };
    expect(codes(propose(c))).toContain('strand_test_missing');
    expect(codes(propose({ ...c, strandTest: 'passed' }))).not.toContain('strand_test_missing');
    expect(codes(propose({ ...c, strandTest: 'failed' }))).toContain('strand_test_failed');
  });

  it('warns about henna, box dye, direct dye and compromised condition', () => {
    const q = propose({ currentLevel: 4, targetLevel: 6, history: { ...virgin, henna: true, boxDye: true, directDye: true }, porosity: 'high' });
    expect(codes(q)).toEqual(expect.arrayContaining(['henna', 'box_dye', 'direct_dye', 'compromised', 'strand_test_missing']));
  });

  it('shows the cautions: skin test, gloves and ventilation, breakage, contact time and heat, 6 % on the scalp, professional judgement', () => {
    const text = propose({}).cautions.join(' ');
    expect(text).toMatch(/skin test/i);
    expect(text).toMatch(/gloves/i);
    expect(text).toMatch(/ventilation/i);
    expect(text).toMatch(/breakage/i);
    expect(text).toMatch(/first section/i);
    expect(text).toMatch(/heat roughly halves/i);
    // Common practice: lightener on the scalp with 20 volume (6 %) developer at most.
    expect(text).toMatch(/6 % \(20 volume\)/);
    expect(text).toMatch(/judgement and local regulations/i);
  });
});

describe('consultation input', () => {
  it('refuses levels outside the 1–10 scale, naming the field', () => {
    const r = ConsultationInputSchema.safeParse({ ...base, currentLevel: 0, targetLevel: 11 });
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.path.join('.'))).toEqual(['currentLevel', 'targetLevel']);
  });

  it('reads a record without the vivid answer as no vivid shade', () => {
    const { vivid: _left, ...older } = base;
    expect(ConsultationInputSchema.parse(older).vivid).toBe(false);
  });
});
