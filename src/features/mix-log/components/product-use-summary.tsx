import type { ProductUseLine } from '@shared/schemas/mix-log.schemas';
import { partKindLabels } from '../product-type-labels';
import { formatMoney } from '@shared/money/money';

type Props = { totals: ProductUseLine[]; totalGrams: number; estimatedCostCents: number | null; currency: string };

function lineCost(t: ProductUseLine, currency: string): string {
  if (t.kind === 'other') return 'not costed';
  if (t.centsPerGram === null || t.costCents === null) return 'no cost set (Set-up → Quote prices)';
  return `× ${t.centsPerGram} cents a gram = ${formatMoney(t.costCents, currency)}`;
}

/** A sitting's product used, each kind of part as itself, with the owner's costs per gram where set. */
export function ProductUseSummary({ totals, totalGrams, estimatedCostCents, currency }: Props) {
  const unpriced = totals.filter((t) => t.kind !== 'other' && t.costCents === null).map((t) => partKindLabels[t.kind]);
  return (
    <div className="tabular flex flex-col gap-1 text-sm">
      <p className="font-bold">Product used:</p>
      <ul className="list-disc pl-5">
        {totals.map((t) => (
          <li key={t.kind}>
            {partKindLabels[t.kind]} {t.grams} g — {lineCost(t, currency)}
          </li>
        ))}
      </ul>
      <p>
        {totalGrams} g in all · <span className="font-bold">Estimated product cost:</span>{' '}
        {estimatedCostCents === null ? `not known (no cost set for ${unpriced.join(', ')})` : formatMoney(estimatedCostCents, currency)}
      </p>
    </div>
  );
}
