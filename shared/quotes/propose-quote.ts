/**
 * Quote rules: a consultation and the salon's prices in, a proposed quote out (step plan, sittings, days
 * apart, minutes, price, deposit, warnings). Pure: no IO, no clock. The stylist edits the result; Dwell's
 * numbers are aids, and the licensed professional's judgement and local regulations decide.
 *
 * Every rule of thumb below is marked "common practice" (CP): trade practice as commonly taught, from
 * memory, not from a standard. docs/quotes.md lists the same assumptions for people who do not read code.
 */
import type { ColourHistory, ConsultationInput, DepositPolicy, HairDensity, HairLength, QuoteWarning } from '../schemas/consultation.schemas';
import type { ProductType } from '../schemas/mix-log.schemas';
import type { PlannedStep, ProductFamily, StepPlan } from '../schemas/step-plan.schemas';

export type QuotePricing = {
  /** The salon's hourly rate for correction and colour chair time, in cents. */
  correctionCentsPerHour: number;
  /** The salon's per-service price for a cut and finish, in cents (used when the client wants a cut). */
  cutFinishCents: number;
  /** Estimated product cost per gram of mixed product, in cents (may be fractional); absent types cost 0. */
  productCentsPerGram: Partial<Record<ProductType, number>>;
  deposit: DepositPolicy;
};

export type ProposedQuote = {
  stepPlan: StepPlan;
  sittings: number;
  daysApart: { min: number; max: number } | null;
  /** The price, line by line, in cents. */
  lines: { label: string; cents: number }[];
  productGrams: Partial<Record<ProductType, number>>;
  productCostCents: number;
  priceCents: number;
  depositCents: number;
  warnings: QuoteWarning[];
  cautions: string[];
};

// CP: lift per sitting is about 3–4 levels on virgin hair and about 2 on coloured or lightened hair
// (trade practice, from memory); we take the lower end, 3, for virgin hair.
export const LEVELS_PER_SITTING_VIRGIN = 3;
export const LEVELS_PER_SITTING_COLOURED = 2;
// CP: permanent colour with 20–30 volume developer lifts natural (virgin) hair by up to about 2 levels, so a
// small lift on virgin hair needs no lightener. Colour does not lift artificial colour.
export const COLOUR_LIFT_VIRGIN = 2;
// CP: the gap between lightening or correction sittings is 2–6 weeks, typically 4–6; we propose 2–6.
export const DAYS_BETWEEN_SITTINGS = { min: 14, max: 42 } as const;
// CP: going 3 or more levels darker on lightened hair needs the missing warm pigment put back first (filling).
export const FILL_WHEN_DARKER_BY = 3;

// CP: application time and product grow with length and density; processing (developing) time does not,
// because the chemistry sets it. Factors are our own estimates against medium length, medium density.
export const LENGTH_FACTOR: Record<HairLength, number> = { short: 0.75, medium: 1, long: 1.35, extra_long: 1.7 };
export const DENSITY_FACTOR: Record<HairDensity, number> = { fine: 0.85, medium: 1, thick: 1.25 };

// Mixed grams for one application on medium length, medium density hair (our estimates, from memory).
export const BASE_GRAMS: Record<ProductType, number> = {
  remover: 80,
  lightener: 90,
  toner: 60,
  permanent: 60,
  demi_permanent: 60,
  direct_dye: 80,
  bond_builder: 10,
};

/** Which steps a sitting gets, before minutes are scaled. */
type Stage = 'removal' | 'lightening' | 'toning' | 'fill' | 'colour' | 'finish' | 'cut_finish';

/** Apply, develop and (usually) rinse: the shape of every chemical stage; the product goes on and develops. */
function chemical(product: ProductFamily, apply: [string, number], develop: [string, number, number], rinse?: [string, number]): PlannedStep[] {
  const steps: PlannedStep[] = [
    { kind: 'hands_on', label: apply[0], product, minutes: apply[1] },
    { kind: 'developing', label: develop[0], product, minMinutes: develop[1], maxMinutes: develop[2] },
  ];
  return rinse ? [...steps, { kind: 'basin', label: rinse[0], product: 'none', minutes: rinse[1] }] : steps;
}

// Base minutes (medium length and density). CP, from trade practice (processing times: permanent 30–45 min,
// lightener off within about 45–50 min, toner 10–20 min, remover 20–60 min per application then a long rinse;
// cut 30–60 min, blow-dry 30–45 min). The product's own instructions override these.
const STAGE_STEPS: Record<Stage, PlannedStep[]> = {
  // Toners and fillers in a correction are usually demi-permanent, mixed with developer: oxidative (CP).
  removal: chemical('colour_remover', ['Apply colour remover', 30], ['Remover processes', 20, 40], ['Rinse remover', 20]),
  lightening: chemical('lightener', ['Apply lightener', 50], ['Lightener lifts', 30, 50], ['Rinse lightener', 15]),
  toning: chemical('toner_oxidative', ['Apply toner', 15], ['Toner develops', 10, 20], ['Rinse toner', 10]),
  fill: chemical('oxidative_colour', ['Apply filler (pre-pigment)', 20], ['Filler develops', 10, 20]),
  colour: chemical('oxidative_colour', ['Apply colour', 30], ['Colour develops', 30, 45], ['Rinse and condition', 15]),
  finish: [{ kind: 'hands_on', label: 'Blow-dry', product: 'none', minutes: 35 }],
  cut_finish: [{ kind: 'hands_on', label: 'Cut and finish', product: 'none', minutes: 60 }],
};

// Which product each stage uses (the grams behind the product cost estimate).
const STAGE_PRODUCT: Partial<Record<Stage, ProductType>> = {
  removal: 'remover',
  lightening: 'lightener',
  toning: 'toner',
  fill: 'demi_permanent',
  colour: 'permanent',
};

const roundTo5 = (n: number) => Math.max(5, Math.round(n / 5) * 5);

/** Artificial colour on the hair: anything but natural, untouched hair. */
export function previouslyColoured(h: ColourHistory): boolean {
  return h.permanent || h.directDye || h.boxDye || h.henna || h.previousLightening;
}

/** Scales hands-on and rinse minutes for this head of hair; developing minutes stay as the chemistry needs. */
function scaleStep(step: PlannedStep, c: ConsultationInput): PlannedStep {
  if (step.kind === 'developing') return step;
  const factor = step.kind === 'basin' ? LENGTH_FACTOR[c.length] : LENGTH_FACTOR[c.length] * DENSITY_FACTOR[c.density];
  const minutes = roundTo5(step.minutes * factor);
  return { ...step, minutes: Math.min(minutes, step.kind === 'basin' ? 120 : 600) };
}

/** The stages of each sitting for this consultation. */
export function planStages(c: ConsultationInput): Stage[][] {
  const lift = c.targetLevel - c.currentLevel;
  const coloured = previouslyColoured(c.history);
  // CP: oxidative (permanent, box) dye is taken out with a remover before lightening; colour does not lift colour.
  const removal = lift > 0 && (c.history.permanent || c.history.boxDye);
  const lightening = lift > 0 && (coloured || lift > COLOUR_LIFT_VIRGIN);
  const finish: Stage = 'finish';
  if (!lightening) {
    // Same level, going darker, or a small lift on virgin hair: one colour sitting.
    const fill = lift <= -FILL_WHEN_DARKER_BY && c.history.previousLightening;
    return [[...(removal ? ['removal' as const] : []), ...(fill ? ['fill' as const] : []), 'colour', c.wantsCut ? 'cut_finish' : finish]];
  }
  const perSitting = levelsPerSitting(c);
  const count = Math.min(6, Math.ceil(lift / perSitting));
  return Array.from({ length: count }, (_, i) => {
    const last = i === count - 1;
    const stages: Stage[] = [];
    if (i === 0 && removal) stages.push('removal');
    // CP: lightened hair is toned to neutralise the exposed warm pigment, at every lightening sitting.
    stages.push('lightening', 'toning');
    stages.push(last && c.wantsCut ? 'cut_finish' : finish);
    return stages;
  });
}

/** Levels one sitting may lift: fewer on coloured or compromised hair (CP). */
export function levelsPerSitting(c: ConsultationInput): number {
  let levels = previouslyColoured(c.history) ? LEVELS_PER_SITTING_COLOURED : LEVELS_PER_SITTING_VIRGIN;
  if (compromised(c)) levels -= 1;
  if (c.strandTest === 'fragile') levels -= 1;
  return Math.max(1, levels);
}

/** CP: reduced or poor elasticity, or high porosity, marks hair that breaks more easily under lightener. */
export function compromised(c: ConsultationInput): boolean {
  return c.elasticity !== 'good' || c.porosity === 'high';
}

function warningsFor(c: ConsultationInput, stages: Stage[][]): QuoteWarning[] {
  const all = stages.flat();
  const lightens = all.includes('lightening') || all.includes('removal');
  const w: QuoteWarning[] = [];
  if (lightens && previouslyColoured(c.history) && c.strandTest === 'none') {
    w.push({ code: 'strand_test_missing', message: 'Lightening or removal on previously coloured hair with no strand test on record: do a strand test first (common practice).' });
  }
  if (lightens && c.strandTest === 'failed') {
    w.push({ code: 'strand_test_failed', message: 'The strand test failed: lightening this hair risks breakage. Rethink the plan before booking.' });
  }
  if (c.history.henna) {
    w.push({ code: 'henna', message: 'Henna or plant dye: some contain metallic salts that react with peroxide, and henna lifts unevenly. Strand test before any oxidative product (common practice).' });
  }
  if (c.history.boxDye) {
    w.push({ code: 'box_dye', message: 'Box dye builds up unevenly; removal may need more than one cycle and results vary along the length (common practice).' });
  }
  if (c.history.directDye && lightens) {
    w.push({ code: 'direct_dye', message: 'Colour removers do not take out direct (vivid) dyes; stains may stay after lightening (common practice).' });
  }
  if (lightens && compromised(c)) {
    w.push({ code: 'compromised', message: 'The condition notes show compromised hair (elasticity or porosity): lightening risks breakage. A strand test and a bond builder are advised, and fewer levels per sitting are planned.' });
  }
  if (stages.length > 1) {
    w.push({ code: 'split', message: `Lifting ${c.targetLevel - c.currentLevel} levels is split over ${stages.length} sittings, ${levelsPerSitting(c)} levels at most each (common practice).` });
  }
  return w;
}

/** The cautions shown with every quote that puts oxidative products on the hair. */
export const QUOTE_CAUTIONS = [
  'A skin test, applied at least the salon’s lead time before and read before the colour, is needed before oxidative colour (permanent, demi-permanent, toner); any reaction means no oxidative colour until it is cleared.',
  'Wear suitable gloves for mixing, applying and rinsing; mix powder lightener where the air moves (good ventilation).',
  'Lightening compromised or previously coloured hair risks breakage: a strand test is advised.',
  'These numbers are aids. The licensed professional’s judgement and local regulations decide.',
];

/** Rounds a price up to the whole currency unit, as a quote is given to the client. */
const roundUpToUnit = (cents: number) => Math.ceil(cents / 100) * 100;

export function depositFor(policy: DepositPolicy, priceCents: number): number {
  const cents = policy.kind === 'fixed' ? policy.cents : Math.round((priceCents * policy.percent) / 100);
  return Math.min(cents, priceCents);
}

/** The proposed quote for a consultation at the salon's prices. */
export function proposeQuote(c: ConsultationInput, pricing: QuotePricing): ProposedQuote {
  const stages = planStages(c);
  const sittings: StepPlan['sittings'] = stages.map((list, i) => ({
    ...(i > 0 ? { daysAfterPrevious: { ...DAYS_BETWEEN_SITTINGS } } : {}),
    steps: list.flatMap((s) => STAGE_STEPS[s].map((step) => scaleStep(step, c))),
  }));

  const hairFactor = LENGTH_FACTOR[c.length] * DENSITY_FACTOR[c.density];
  const productGrams: Partial<Record<ProductType, number>> = {};
  const addGrams = (type: ProductType, grams: number) => (productGrams[type] = (productGrams[type] ?? 0) + Math.round(grams));
  for (const s of stages.flat()) {
    const product = STAGE_PRODUCT[s];
    if (product) addGrams(product, BASE_GRAMS[product] * hairFactor);
    // CP: a bond builder goes into the lightener bowl on compromised or previously coloured hair.
    if (s === 'lightening' && (compromised(c) || previouslyColoured(c.history))) addGrams('bond_builder', BASE_GRAMS.bond_builder * hairFactor);
  }
  const productCostCents = Math.round(
    Object.entries(productGrams).reduce((t, [type, g]) => t + g * (pricing.productCentsPerGram[type as ProductType] ?? 0), 0),
  );

  // Chair time is billed at the hourly rate with developing at its most (the chair is held meanwhile);
  // a cut and finish is billed at its own service price instead.
  const billedMinutes = stages
    .flat()
    .filter((s) => s !== 'cut_finish')
    .flatMap((s) => STAGE_STEPS[s].map((step) => scaleStep(step, c)))
    .reduce((t, s) => t + (s.kind === 'developing' ? s.maxMinutes : s.minutes), 0);
  const timeCents = Math.round((billedMinutes / 60) * pricing.correctionCentsPerHour);
  const lines = [{ label: `Colour work, ${billedMinutes} min at the hourly rate`, cents: timeCents }];
  if (c.wantsCut) lines.push({ label: 'Cut and finish', cents: pricing.cutFinishCents });
  if (productCostCents > 0) lines.push({ label: 'Product (estimate)', cents: productCostCents });
  const priceCents = roundUpToUnit(lines.reduce((t, l) => t + l.cents, 0));

  return {
    stepPlan: { sittings },
    sittings: sittings.length,
    daysApart: sittings.length > 1 ? { ...DAYS_BETWEEN_SITTINGS } : null,
    lines,
    productGrams,
    productCostCents,
    priceCents,
    depositCents: depositFor(pricing.deposit, priceCents),
    warnings: warningsFor(c, stages),
    cautions: QUOTE_CAUTIONS,
  };
}
