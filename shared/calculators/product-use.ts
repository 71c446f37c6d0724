/**
 * Product used at a sitting and its estimated cost. Pure: no IO, no clock.
 *
 * Every weighed part of every bowl counts as what it is: the lightener grams of a lightener bowl as
 * lightener, its developer grams as developer. Each kind's grams are priced at the owner's cost per gram for
 * that kind (Set-up → Quote prices); a kind used without a cost makes the sitting's estimate unknown rather
 * than too low. `other` parts (water, non-peroxide cream, additives) are weighed but never costed.
 */
import { MixPartKindSchema, type CostedProduct, type MixPart, type ProductUseLine } from '../schemas/mix-log.schemas';

export type ProductUse = { totals: ProductUseLine[]; totalGrams: number; estimatedCostCents: number | null };

/** Scales show tenths of a gram. */
const tenths = (n: number) => Math.round(n * 10) / 10;

/**
 * Totals per kind of part (in the kinds' fixed order: product types, developer, other), each line's cost in
 * whole cents (its grams × cents per gram, rounded), and the estimate as the sum of the lines shown.
 */
export function productUse(parts: Pick<MixPart, 'kind' | 'grams'>[], centsPerGram: Partial<Record<CostedProduct, number>>): ProductUse {
  const grams = new Map<MixPart['kind'], number>();
  for (const p of parts) grams.set(p.kind, (grams.get(p.kind) ?? 0) + p.grams);
  const totals = MixPartKindSchema.options
    .filter((kind) => grams.has(kind))
    .map((kind): ProductUseLine => {
      const g = tenths(grams.get(kind)!);
      const cost = kind === 'other' ? undefined : centsPerGram[kind];
      return { kind, grams: g, centsPerGram: cost ?? null, costCents: cost === undefined ? null : Math.round(g * cost) };
    });
  const costed = totals.filter((t) => t.kind !== 'other');
  const estimatedCostCents = costed.every((t) => t.costCents !== null) ? costed.reduce((a, t) => a + t.costCents!, 0) : null;
  return { totals, totalGrams: tenths(totals.reduce((a, t) => a + t.grams, 0)), estimatedCostCents };
}
