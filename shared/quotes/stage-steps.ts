/**
 * The steps of each stage of a proposed quote, sized for this head of hair and held within the salon's
 * processing limits. Pure. Minutes marked CP are trade practice as commonly taught, from memory; the product's
 * own instructions override them. docs/quotes.md lists the same numbers.
 */
import type { ConsultationInput, HairDensity, HairLength } from '../schemas/consultation.schemas';
import type { ProductType } from '../schemas/mix-log.schemas';
import type { PlannedStep, ProductFamily } from '../schemas/step-plan.schemas';
import { HEAT_FACTOR, isLimited, limitedFamilyNames, limitFor, type LimitedFamily, type ProcessingLimits } from '../rules/processing-limits';

export type Stage = 'strand_check' | 'removal' | 'lightening' | 'bond_care' | 'toning' | 'fill' | 'colour' | 'vivid' | 'finish' | 'cut_finish';

// CP: application time and product grow with length and density; processing (developing) time does not,
// because the chemistry sets it. Factors are our own estimates against medium length, medium density.
export const LENGTH_FACTOR: Record<HairLength, number> = { short: 0.75, medium: 1, long: 1.35, extra_long: 1.7 };
export const DENSITY_FACTOR: Record<HairDensity, number> = { fine: 0.85, medium: 1, thick: 1.25 };

/** CP: a head is commonly worked in four sections (quadrants); a stage that needs more is refused. */
export const MAX_SECTIONS = 4;
/** Our estimate: a vivid shade is placed section by section, at most this many minutes of application each. */
export const VIVID_SECTION_MINUTES = 20;

type Chemical = {
  product: ProductFamily;
  labels: { apply: string; develop: string; rinse: string };
  /** Hands-on minutes for the whole head, medium length and density. */
  apply: number;
  /** Least and most processing without heat, as taught. */
  develop: [number, number];
  rinse: number;
  heat: boolean;
  /** Placed in sections whatever the limits (a vivid shade), processed together afterwards. */
  placed?: boolean;
  /** Mixed grams for one application of the whole head (our estimates, from memory). */
  grams: [ProductType, number];
};

// Base minutes (medium length and density), CP: remover applied quickly and processed with heat, then rinsed
// thoroughly; full-head lightener application 30–45 min, checked from about 20 min; toner 10–20 min; permanent
// colour 30–45 min; filler 10–20 min; direct dyes 20–30 min; cut 30–60 min, blow-dry 30–45 min.
export const CHEMICAL_STAGES = {
  removal: {
    product: 'colour_remover',
    labels: { apply: 'Apply colour remover', develop: 'Remover processes under heat', rinse: 'Rinse remover thoroughly' },
    apply: 15,
    develop: [20, 40],
    rinse: 15,
    heat: true,
    grams: ['remover', 80],
  },
  lightening: {
    product: 'lightener',
    labels: { apply: 'Apply lightener', develop: 'Lightener lifts', rinse: 'Rinse lightener' },
    apply: 40,
    develop: [20, 50],
    rinse: 15,
    heat: false,
    grams: ['lightener', 90],
  },
  // Toners and fillers in a correction are usually demi-permanent, mixed with developer: oxidative (CP).
  toning: {
    product: 'toner_oxidative',
    labels: { apply: 'Apply toner', develop: 'Toner develops', rinse: 'Rinse toner' },
    apply: 10,
    develop: [10, 20],
    rinse: 10,
    heat: false,
    grams: ['toner', 60],
  },
  fill: {
    product: 'oxidative_colour',
    labels: { apply: 'Apply filler (pre-pigment)', develop: 'Filler develops', rinse: 'Rinse filler' },
    apply: 20,
    develop: [10, 20],
    rinse: 10,
    heat: false,
    grams: ['demi_permanent', 60],
  },
  colour: {
    product: 'oxidative_colour',
    labels: { apply: 'Apply colour', develop: 'Colour develops', rinse: 'Rinse and condition' },
    apply: 15,
    develop: [30, 45],
    rinse: 15,
    heat: false,
    grams: ['permanent', 60],
  },
  vivid: {
    product: 'direct_dye',
    labels: { apply: 'Apply vivid colour', develop: 'Vivid colour develops', rinse: 'Cool rinse' },
    apply: 40,
    develop: [20, 30],
    rinse: 15,
    heat: false,
    placed: true,
    grams: ['direct_dye', 80],
  },
} satisfies Partial<Record<Stage, Chemical>>;

type FixedStep = Extract<PlannedStep, { kind: 'hands_on' | 'basin' }>;
const SIMPLE_STAGES: Partial<Record<Stage, FixedStep>> = {
  // A look and stretch test of a strand on the day, before anything goes on (CP); no product.
  strand_check: { kind: 'hands_on', label: 'Check-in and strand check', product: 'none', minutes: 15 },
  // CP: a bond-building treatment at the basin after lightening, about 10–15 min.
  bond_care: { kind: 'basin', label: 'Bond treatment', product: 'bond_care', minutes: 15 },
  finish: { kind: 'hands_on', label: 'Blow-dry', product: 'none', minutes: 35 },
  cut_finish: { kind: 'hands_on', label: 'Cut and finish', product: 'none', minutes: 60 },
};

/** Our estimate, from memory: grams of bond-building treatment for one medium head. */
export const BOND_TREATMENT_GRAMS = 20;

const roundTo5 = (n: number) => Math.max(5, Math.round(n / 5) * 5);
const upTo5 = (n: number) => Math.max(5, Math.ceil(n / 5) * 5);

export const hairFactor = (c: ConsultationInput) => LENGTH_FACTOR[c.length] * DENSITY_FACTOR[c.density];
const handsMinutes = (base: number, c: ConsultationInput) => Math.min(600, roundTo5(base * hairFactor(c)));
const basinMinutes = (base: number, c: ConsultationInput) => Math.min(120, roundTo5(base * LENGTH_FACTOR[c.length]));

/** The quote rules cannot plan a stage within the salon's limits: the stylist plans it, or the owner changes a limit. */
export class ProposalRefused extends Error {}

/** Fewest sections whose application plus the least processing fits the limit (each section rinsed before the next). */
function sectionsWithin(family: LimitedFamily, apply: number, least: number, limit: number, heat: boolean): number {
  for (let n = 1; n <= MAX_SECTIONS; n++) if (upTo5(apply / n) + least <= limit) return n;
  const a = upTo5(apply / MAX_SECTIONS);
  throw new ProposalRefused(
    `${limitedFamilyNames[family]} cannot be planned within this salon's limit of ${limit} min on the hair${heat ? ' with heat' : ''}: even in ` +
      `${MAX_SECTIONS} sections, applying ${a} min and processing at least ${least} min keeps it on ${a + least} min. ` +
      'Plan this stage by hand, or change the limit in Set-up → Salon.',
  );
}

const numbered = (label: string, what: string, k: number, n: number) => (n > 1 ? `${label}, ${what} ${k} of ${n}` : label);

/** A stage's steps; `sectionedFor` names the limit that made it go in sections (absent when it went on in one). */
export type BuiltStage = { stage: Stage; steps: PlannedStep[]; sectionedFor?: { family: LimitedFamily; minutes: number; heat: boolean } };

/**
 * One stage's steps for this hair. A limited product is applied, processed and rinsed so that application plus
 * the most processing stays within the limit (contact time counts from the first section): the developing most is
 * what the limit leaves after the application, and when even the least time does not fit, the head is done in
 * sections, each rinsed before the next. Rounds repeat the whole stage (a second remover cycle).
 */
export function stageSteps(stage: Stage, c: ConsultationInput, limits: ProcessingLimits, rounds = 1): BuiltStage {
  const simple = SIMPLE_STAGES[stage];
  if (simple) {
    const minutes = simple.kind === 'basin' ? basinMinutes(simple.minutes, c) : handsMinutes(simple.minutes, c);
    return { stage, steps: [{ ...simple, minutes }] };
  }
  const def: Chemical = CHEMICAL_STAGES[stage as keyof typeof CHEMICAL_STAGES];
  const factor = def.heat ? HEAT_FACTOR : 1;
  const least = roundTo5(def.develop[0] * factor);
  const most = roundTo5(def.develop[1] * factor);
  const apply = handsMinutes(def.apply, c);
  const rinse = basinMinutes(def.rinse, c);
  const limit = limitFor(def.product, limits, def.heat);
  const heat = def.heat ? { heat: true } : {};
  const product = def.product;
  const steps: PlannedStep[] = [];
  let sectionedFor: BuiltStage['sectionedFor'];
  for (let r = 1; r <= rounds; r++) {
    const round = (label: string) => numbered(label, 'round', r, rounds);
    if (def.placed) {
      // Placed section by section, then processed and rinsed together: no limit applies to direct dye.
      const sections = Math.max(2, Math.ceil(apply / VIVID_SECTION_MINUTES));
      for (let k = 1; k <= sections; k++)
        steps.push({ kind: 'hands_on', label: numbered(round(def.labels.apply), 'section', k, sections), product, minutes: upTo5(apply / sections) });
      steps.push({ kind: 'developing', label: round(def.labels.develop), product, minMinutes: least, maxMinutes: most, ...heat });
      steps.push({ kind: 'basin', label: round(def.labels.rinse), product: 'none', minutes: rinse });
      continue;
    }
    const sections = limit === null || !isLimited(product) ? 1 : sectionsWithin(product, apply, least, limit, def.heat);
    if (sections > 1 && limit !== null && isLimited(product)) sectionedFor = { family: product, minutes: limit, heat: def.heat };
    const a = sections === 1 ? apply : upTo5(apply / sections);
    const longest = limit === null ? most : Math.min(most, limit - a);
    for (let k = 1; k <= sections; k++) {
      const part = (label: string) => numbered(round(label), 'section', k, sections);
      steps.push({ kind: 'hands_on', label: part(def.labels.apply), product, minutes: a });
      steps.push({ kind: 'developing', label: part(def.labels.develop), product, minMinutes: least, maxMinutes: longest, ...heat });
      steps.push({ kind: 'basin', label: part(def.labels.rinse), product: 'none', minutes: sections === 1 ? rinse : roundTo5(rinse / sections) });
    }
  }
  return { stage, steps, ...(sectionedFor && { sectionedFor }) };
}

/** The product type and mixed grams one application of a stage uses on a medium head, if any. */
export function stageGrams(stage: Stage): [ProductType, number] | null {
  if (stage === 'bond_care') return ['bond_builder', BOND_TREATMENT_GRAMS];
  const def = (CHEMICAL_STAGES as Partial<Record<Stage, Chemical>>)[stage];
  return def ? def.grams : null;
}
