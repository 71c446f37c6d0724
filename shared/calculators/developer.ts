/**
 * Developer (hydrogen peroxide) arithmetic for the mix log. Pure: no IO, no clock.
 *
 * Strengths are mass percent of H2O2. Salon developers are labelled w/w while the volume definition gives
 * w/v; at 3–12 % the two differ by the solution's density (≈1.02–1.04), which the trade treats as equal,
 * so mixing is done in grams with C1·m1 = C2·m2. The numbers are aids; the licensed professional's
 * judgement and local regulations decide.
 */

/** Molar mass of H2O2 in g/mol (IUPAC atomic weights). */
export const H2O2_MOLAR_MASS = 34.0147;
/** Molar volume of an ideal gas at 0 °C and 101.325 kPa in L/mol (CODATA 2018). */
export const MOLAR_VOLUME_LITRES = 22.41396954;
/**
 * "x volume" = 1 L of solution releases x L of O2; 2 H2O2 → 2 H2O + O2, so each litre of O2 takes
 * 2 mol / 22.414 L of H2O2: 2 × 34.0147 / 22.41397 = 3.0351 g/L per volume.
 */
export const GRAMS_PER_LITRE_PER_VOLUME = (2 * H2O2_MOLAR_MASS) / MOLAR_VOLUME_LITRES;
/** 3.0351 g/L = 0.30351 g per 100 mL (% w/v) per volume. */
export const PERCENT_PER_VOLUME = GRAMS_PER_LITRE_PER_VOLUME / 10;
/** The trade's rounding, printed on developer bottles (20 vol = 6 %). */
export const TRADE_PERCENT_PER_VOLUME = 0.3;
/** EU Reg. (EC) 1223/2009 Annex III entry 12(a): hair products at most 12 % H2O2 (40 volumes). The salon default. */
export const EU_HAIR_MAX_PERCENT = 12;
/**
 * The EU limit in the regulation's own words, offered as the default for the salon's jurisdiction: the owner
 * sets the salon's maximum, and local rules and licensed practice decide.
 */
export const EU_HAIR_LIMIT_WORDS =
  'The EU Cosmetics Regulation (EC) No 1223/2009, Annex III entry 12, limits hair products to "12 % of H2O2 (40 volumes)". ' +
  "Dwell uses it as the default maximum; the salon's own jurisdiction, local rules and licensed practice decide.";

/** A refused input, naming the field so forms and the API can put the message beside it. */
export class CalculatorError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

type Rounding = { trade?: boolean };
const factor = (o: Rounding) => (o.trade ? TRADE_PERCENT_PER_VOLUME : PERCENT_PER_VOLUME);
const round = (n: number, places: number) => Math.round(n * 10 ** places) / 10 ** places;

function nonNegative(value: number, field: string): void {
  if (!Number.isFinite(value) || value < 0) throw new CalculatorError(field, `${field} must be a number of 0 or more.`);
}

export function volumeToPercent(volume: number, o: Rounding = {}): number {
  nonNegative(volume, 'volume');
  return volume * factor(o);
}

export function percentToVolume(percent: number, o: Rounding = {}): number {
  nonNegative(percent, 'percent');
  return percent / factor(o);
}

/**
 * A strength as the trade says it, percent with volumes: 6 → "6 % (20 vol)". Bottles are labelled with the
 * rounded factor (3/6/9/12 % = 10/20/30/40 vol), so the trade factor is used; one decimal at most.
 */
export function strengthWords(percent: number): string {
  const tenth = (n: number) => String(round(n, 1));
  return `${tenth(percent)} % (${tenth(percentToVolume(percent, { trade: true }))} vol)`;
}

/** Refuses a developer stronger than the salon allows, with the reason. */
export function checkDeveloperStrength(percent: number, maxPercent: number, field = 'developerPercent'): void {
  nonNegative(percent, field);
  if (percent > maxPercent) {
    throw new CalculatorError(
      field,
      `${strengthWords(percent)} is above this salon's maximum of ${strengthWords(maxPercent)} hydrogen peroxide (EU limit for hair products: 12 % of H2O2, 40 volumes).`,
    );
  }
}

/** "1:1.5" → [1, 1.5]. Every part must be a number above 0: "1:0" would mean no such part. */
export function parseRatio(ratio: string, field = 'ratio'): number[] {
  const pieces = ratio.split(':').map((p) => p.trim());
  const parts = pieces.map(Number);
  if (pieces.length < 2 || pieces.length > 6 || pieces.some((p) => p === '') || parts.some((p) => !Number.isFinite(p))) {
    throw new CalculatorError(field, 'Write a ratio like 1:1.5 (2 to 6 parts).');
  }
  if (parts.some((p) => p <= 0)) throw new CalculatorError(field, 'Every part of a ratio must be more than 0.');
  return parts;
}

/** A ratio and a bowl size → grams of each part, to 0.1 g (what salon scales show). */
export function splitBowl(ratio: string, totalGrams: number): number[] {
  nonNegative(totalGrams, 'totalGrams');
  const parts = parseRatio(ratio);
  const sum = parts.reduce((a, b) => a + b, 0);
  return parts.map((p) => round((totalGrams * p) / sum, 1));
}

export interface BowlPart {
  grams: number;
  /** H2O2 % of this part; 0 for colour, lightener powder, water or cream. */
  peroxidePercent: number;
}

/** The peroxide % of a mixed bowl: Σ(Cᵢ·mᵢ) / Σmᵢ. */
export function bowlPercent(parts: BowlPart[]): number {
  parts.forEach((p, i) => {
    nonNegative(p.grams, `parts.${i}.grams`);
    nonNegative(p.peroxidePercent, `parts.${i}.peroxidePercent`);
  });
  const total = parts.reduce((a, p) => a + p.grams, 0);
  if (total === 0) throw new CalculatorError('parts', 'The bowl is empty.');
  return parts.reduce((a, p) => a + p.grams * p.peroxidePercent, 0) / total;
}

/** The peroxide % on the head for "colour : developer" by ratio (developer is the last part). */
export function ratioBowlPercent(ratio: string, developerPercent: number): number {
  const parts = parseRatio(ratio);
  const last = parts.length - 1;
  return bowlPercent(parts.map((p, i) => ({ grams: p, peroxidePercent: i === last ? developerPercent : 0 })));
}

export interface TwoDeveloperMix {
  lowerGrams: number;
  higherGrams: number;
}

/**
 * Grams of a weaker and a stronger developer that make `totalGrams` at `targetPercent`:
 * lower·(H − T) = higher·(T − L). A weaker strength of 0 is water or non-peroxide cream (dilution).
 */
export function mixTwoDevelopers(input: {
  lowerPercent: number;
  higherPercent: number;
  targetPercent: number;
  totalGrams: number;
  maxPercent?: number;
}): TwoDeveloperMix {
  const { lowerPercent: L, higherPercent: H, targetPercent: T, totalGrams } = input;
  nonNegative(L, 'lowerPercent');
  nonNegative(H, 'higherPercent');
  nonNegative(totalGrams, 'totalGrams');
  if (H <= L) throw new CalculatorError('higherPercent', 'The stronger developer must be stronger than the weaker one.');
  checkDeveloperStrength(T, input.maxPercent ?? EU_HAIR_MAX_PERCENT, 'targetPercent');
  if (T < L || T > H) throw new CalculatorError('targetPercent', `The target must lie between ${L} % and ${H} %.`);
  const higherGrams = round((totalGrams * (T - L)) / (H - L), 1);
  return { lowerGrams: round(totalGrams - higherGrams, 1), higherGrams };
}

/** Diluting with water or non-peroxide cream: mixing with a 0 % part. */
export function dilute(input: { percent: number; targetPercent: number; totalGrams: number; maxPercent?: number }): {
  developerGrams: number;
  diluentGrams: number;
} {
  const mix = mixTwoDevelopers({
    lowerPercent: 0,
    higherPercent: input.percent,
    targetPercent: input.targetPercent,
    totalGrams: input.totalGrams,
    maxPercent: input.maxPercent,
  });
  return { developerGrams: mix.higherGrams, diluentGrams: mix.lowerGrams };
}
