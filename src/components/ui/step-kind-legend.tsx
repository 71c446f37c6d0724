import type { StepKind } from '@shared/schemas/common.schemas';
import { stepKindLabels } from '@client/lib/booking-labels';
import { StepKindIcon } from './step-kind-icon';
import { StepKindSwatch } from './step-kind-swatch';

const kinds: { kind: StepKind; meaning: string }[] = [
  { kind: 'hands_on', meaning: 'stylist working' },
  { kind: 'developing', meaning: 'product processing, hands free' },
  { kind: 'basin', meaning: 'rinse or treatment at a basin' },
];

/** The key to the step patterns, shown wherever steps are drawn. */
export function StepKindLegend() {
  return (
    <ul aria-label="Key to step kinds" className="flex flex-wrap gap-x-5 gap-y-2 text-sm">
      {kinds.map(({ kind, meaning }) => (
        <li key={kind} className="flex items-center gap-2">
          <StepKindSwatch kind={kind} />
          <StepKindIcon kind={kind} />
          <span>
            <strong>{stepKindLabels[kind]}</strong> — {meaning}
          </span>
        </li>
      ))}
    </ul>
  );
}
