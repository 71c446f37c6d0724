/**
 * Quote rules: a consultation, the salon's prices and its planning rules (processing limits, lift per sitting)
 * in, a proposed quote out (step plan, sittings, days apart, minutes, price, deposit, warnings). Pure: no IO, no
 * clock. The stylist edits the result; Dwell's numbers are aids, and the licensed professional's judgement and
 * local regulations decide.
 *
 * Every rule of thumb below is marked "common practice" (CP): trade practice as commonly taught, from
 * memory, not from a standard. docs/quotes.md lists the same assumptions for people who do not read code.
 */
import type { ConsultationInput, DepositPolicy, QuoteWarning } from '../schemas/consultation.schemas';
import type { ProductType } from '../schemas/mix-log.schemas';
import type { StepPlan } from '../schemas/step-plan.schemas';
import { limitedFamilyNames, type ProcessingLimits } from '../rules/processing-limits';
import { compromised, hairState, hairStateNames, levelsPerSitting, previouslyColoured, type LiftPerSitting } from './lift-per-sitting';
import { hairFactor, stageGrams, stageSteps, type BuiltStage, type Stage } from './stage-steps';
import { minorPerUnit } from '../money/currency-exponent';

export type QuotePricing = {
  /** The salon's hourly rate for correction and colour chair time, in cents. */
  correctionCentsPerHour: number;
  /** The salon's per-service price for a cut and finish, in cents (used when the client wants a cut). */
  cutFinishCents: number;
  /** Estimated product cost per gram of mixed product, in cents (may be fractional); absent types cost 0. */
  productCentsPerGram: Partial<Record<ProductType, number>>;
  deposit: DepositPolicy;
  /** ISO 4217 code: the price is rounded up to its whole unit. */
  currency: string;
};

/** The salon's planning rules the proposal follows (Set-up → Salon). */
export type PlanningRules = { processingLimits: ProcessingLimits; liftPerSitting: LiftPerSitting };

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

// CP: permanent colour with 20–30 volume developer lifts natural (virgin) hair by up to about 2 levels, so a
// small lift on virgin hair needs no lightener. Colour does not lift artificial colour.
export const COLOUR_LIFT_VIRGIN = 2;
/**
 * CP (from memory): a correction continues after the hair and scalp have rested a few days, with bond care
 * between, and within two weeks so the plan still fits the hair as assessed. The stylist widens it on the quote
 * for slow, gradual lightening (often 2–6 weeks apart).
 */
export const DAYS_BETWEEN_SITTINGS = { min: 3, max: 14 } as const;
/** The step plan's limit on sittings: the plan says what it leaves undone beyond it. */
export const MAX_SITTINGS = 6;
// CP: going 3 or more levels darker on lightened hair needs the missing warm pigment put back first (filling).
export const FILL_WHEN_DARKER_BY = 3;
/** CP: box dye builds up unevenly, and removing it usually takes two remover cycles. */
export const REMOVER_ROUNDS_BOX_DYE = 2;

/** What the rules decided, before steps: stages per sitting, and the lift they reach. */
type StagePlan = { sittings: Stage[][]; lightening: boolean; perSitting: number | null; reached: number; liftLeftOut: boolean };

/** The stages of each sitting for this consultation. */
export function planStages(c: ConsultationInput, lift: LiftPerSitting): StagePlan {
  const levels = c.targetLevel - c.currentLevel;
  const coloured = previouslyColoured(c.history);
  const lightening = levels > 0 && (coloured || levels > COLOUR_LIFT_VIRGIN);
  // CP: oxidative (permanent, box) dye is taken out with a remover before lightening; colour does not lift colour.
  const removal = lightening && (c.history.permanent || c.history.boxDye);
  const end: Stage = c.wantsCut ? 'cut_finish' : 'finish';
  const none = { lightening, perSitting: null, reached: c.currentLevel };
  if (lightening && c.strandTest === 'failed') {
    // A failed strand test stops lightener and remover: a care sitting only, and the lift is left undone (warned).
    return { ...none, sittings: [['bond_care', end]], liftLeftOut: true };
  }
  if (!lightening) {
    // Same level, going darker, or a small lift on virgin hair: one sitting, colour or a vivid shade.
    const fill = levels <= -FILL_WHEN_DARKER_BY && c.history.previousLightening;
    const work: Stage[] = c.vivid ? ['vivid'] : [...(fill ? ['fill' as const] : []), 'colour'];
    return { ...none, reached: c.targetLevel, sittings: [[...work, end]], liftLeftOut: false };
  }
  const perSitting = levelsPerSitting(c, lift);
  const needed = Math.ceil(levels / perSitting);
  const count = Math.min(MAX_SITTINGS, needed);
  // CP: fragile or compromised hair gets a bond treatment after each lightening.
  const care = c.strandTest === 'fragile' || compromised(c);
  const sittings = Array.from({ length: count }, (_, i) => {
    const last = i === count - 1;
    const stages: Stage[] = [];
    if (i === 0 && coloured) stages.push('strand_check');
    if (i === 0 && removal) stages.push('removal');
    stages.push('lightening');
    if (care) stages.push('bond_care');
    // CP: lightened hair is toned to neutralise the exposed warm pigment; at the last sitting a vivid shade does that.
    stages.push(last && c.vivid ? 'vivid' : 'toning');
    stages.push(last ? end : 'finish');
    return stages;
  });
  return { sittings, lightening, perSitting, reached: Math.min(c.targetLevel, c.currentLevel + count * perSitting), liftLeftOut: needed > MAX_SITTINGS };
}

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

function warningsFor(c: ConsultationInput, plan: StagePlan, sectioned: Map<Stage, NonNullable<BuiltStage['sectionedFor']>>): QuoteWarning[] {
  const all = plan.sittings.flat();
  const lightens = all.includes('lightening') || all.includes('removal');
  const levels = c.targetLevel - c.currentLevel;
  const w: QuoteWarning[] = [];
  if (lightens && previouslyColoured(c.history) && c.strandTest === 'none') {
    w.push({
      code: 'strand_test_missing',
      message: 'Lightening or removal on previously coloured hair with no strand test on record: do a strand test first (common practice).',
    });
  }
  if (plan.lightening && c.strandTest === 'failed') {
    w.push({
      code: 'strand_test_failed',
      message: `The strand test failed: no lightener and no colour remover are planned, so the ${plural(levels, 'level')} of lift asked for are left undone. Treat the hair and strand test again first. To plan them anyway, write the reason on the quote; it is kept with it.`,
    });
  }
  if (lightens && c.strandTest === 'fragile') {
    w.push({
      code: 'fragile',
      message: `The strand test showed fragile hair: at most ${plural(plan.perSitting!, 'level')} a sitting (one fewer than for ${hairStateNames[hairState(c)]} hair) and a bond treatment after lightening (common practice).`,
    });
  }
  if (c.history.henna) {
    w.push({
      code: 'henna',
      message:
        'Henna or plant dye: some contain metallic salts that react with peroxide, and henna lifts unevenly. Strand test before any oxidative product (common practice).',
    });
  }
  if (c.history.boxDye) {
    w.push({
      code: 'box_dye',
      message: 'Box dye builds up unevenly; removal is planned as two remover cycles and results vary along the length (common practice).',
    });
  }
  if (c.history.directDye && lightens) {
    w.push({ code: 'direct_dye', message: 'Colour removers do not take out direct (vivid) dyes; stains may stay after lightening (common practice).' });
  }
  if (lightens && compromised(c)) {
    w.push({
      code: 'compromised',
      message:
        'The condition notes show compromised hair (elasticity or porosity): lightening risks breakage. A strand test is advised; a bond treatment and fewer levels per sitting are planned.',
    });
  }
  if (lightens && plan.sittings.length > 1) {
    w.push({
      code: 'split',
      message: `Lifting ${plural(levels, 'level')} is split over ${plan.sittings.length} sittings, ${plural(plan.perSitting!, 'level')} at most each (common practice).`,
    });
  }
  if (lightens && plan.liftLeftOut) {
    const left = c.targetLevel - plan.reached;
    w.push({
      code: 'lift_left',
      message: `${MAX_SITTINGS} sittings of at most ${plural(plan.perSitting!, 'level')} reach level ${plan.reached}, not ${c.targetLevel}: the last ${plural(left, 'level')} are left undone in this plan. Re-assess the hair after these sittings; a sitting never lifts more to catch up (common practice).`,
    });
  }
  if (sectioned.size > 0) {
    const which = [...sectioned.values()].map(
      (l) => `${limitedFamilyNames[l.family].toLowerCase()} (at most ${l.minutes} min on the hair${l.heat ? ' with heat' : ''})`,
    );
    w.push({
      code: 'sections',
      message: `Applied in sections, each rinsed before the next: ${which.join(', ')}. Contact time counts from when the first section gets product, so the whole head at once would stay on longer than the salon allows.`,
    });
  }
  return w;
}

/** The cautions shown with every quote that puts chemical products on the hair. */
export const QUOTE_CAUTIONS = [
  'A skin test, applied at least the salon’s lead time before and read before the colour, is needed before oxidative colour (permanent, demi-permanent, toner); any reaction means no oxidative colour until it is cleared.',
  'Wear suitable gloves for mixing, applying and rinsing; mix powder lightener where the air moves (good ventilation).',
  'Lightening compromised or previously coloured hair risks breakage: a strand test is advised.',
  'Time each product from when the first section gets it, not from when the application ends; heat roughly halves processing time (common practice). The product’s instructions come first.',
  'Lightener on the scalp: at most 6 % (20 volume) developer (common practice); stronger developer only off the scalp, and never above the salon’s maximum.',
  'These numbers are aids. The licensed professional’s judgement and local regulations decide.',
];

/** Rounds a price up to the whole currency unit (ISO 4217 minor units per unit), as a quote is given to the client. */
const roundUpToUnit = (minor: number, currency: string) => Math.ceil(minor / minorPerUnit(currency)) * minorPerUnit(currency);

export function depositFor(policy: DepositPolicy, priceCents: number): number {
  const cents = policy.kind === 'fixed' ? policy.cents : Math.round((priceCents * policy.percent) / 100);
  return Math.min(cents, priceCents);
}

/** How many times a stage is done in its sitting. */
const roundsOf = (stage: Stage, c: ConsultationInput) => (stage === 'removal' && c.history.boxDye ? REMOVER_ROUNDS_BOX_DYE : 1);

/** The proposed quote for a consultation at the salon's prices and planning rules; throws ProposalRefused when a stage cannot fit the limits. */
export function proposeQuote(c: ConsultationInput, pricing: QuotePricing, rules: PlanningRules): ProposedQuote {
  const plan = planStages(c, rules.liftPerSitting);
  const built: BuiltStage[][] = plan.sittings.map((list) => list.map((s) => stageSteps(s, c, rules.processingLimits, roundsOf(s, c))));
  const sittings: StepPlan['sittings'] = built.map((list, i) => ({
    ...(i > 0 ? { daysAfterPrevious: { ...DAYS_BETWEEN_SITTINGS } } : {}),
    steps: list.flatMap((b) => b.steps),
  }));
  const sectioned = new Map(built.flat().flatMap((b) => (b.sectionedFor ? [[b.stage, b.sectionedFor] as const] : [])));

  const factor = hairFactor(c);
  const productGrams: Partial<Record<ProductType, number>> = {};
  const addGrams = (type: ProductType, grams: number) => (productGrams[type] = (productGrams[type] ?? 0) + Math.round(grams));
  for (const s of plan.sittings.flat()) {
    const grams = stageGrams(s);
    if (grams) addGrams(grams[0], grams[1] * factor * roundsOf(s, c));
    // CP: a bond builder goes into the lightener bowl on compromised or previously coloured hair (10 g, our estimate).
    if (s === 'lightening' && (compromised(c) || previouslyColoured(c.history))) addGrams('bond_builder', 10 * factor);
  }
  const productCostCents = Math.round(
    Object.entries(productGrams).reduce((t, [type, g]) => t + g * (pricing.productCentsPerGram[type as ProductType] ?? 0), 0),
  );

  // Chair time is billed at the hourly rate with developing at its most (the chair is held meanwhile);
  // a cut and finish is billed at its own service price instead.
  const billedMinutes = built
    .flat()
    .filter((b) => b.stage !== 'cut_finish')
    .flatMap((b) => b.steps)
    .reduce((t, s) => t + (s.kind === 'developing' ? s.maxMinutes : s.minutes), 0);
  const timeCents = Math.round((billedMinutes / 60) * pricing.correctionCentsPerHour);
  const lines = [{ label: `Colour work, ${billedMinutes} min at the hourly rate`, cents: timeCents }];
  if (c.wantsCut) lines.push({ label: 'Cut and finish', cents: pricing.cutFinishCents });
  if (productCostCents > 0) lines.push({ label: 'Product (estimate)', cents: productCostCents });
  const priceCents = roundUpToUnit(
    lines.reduce((t, l) => t + l.cents, 0),
    pricing.currency,
  );

  return {
    stepPlan: { sittings },
    sittings: sittings.length,
    daysApart: sittings.length > 1 ? { ...DAYS_BETWEEN_SITTINGS } : null,
    lines,
    productGrams,
    productCostCents,
    priceCents,
    depositCents: depositFor(pricing.deposit, priceCents),
    warnings: warningsFor(c, plan, sectioned),
    cautions: QUOTE_CAUTIONS,
  };
}
