import type { StepKind } from '@shared/schemas/common.schemas';
import { stepKindLabels } from '@client/lib/booking-labels';
import { minutesBetween } from '@client/lib/time';
import { formatRange } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { StepKindIcon } from './step-kind-icon';
import { stepKindPattern } from './step-kind-swatch';

type Step = { kind: StepKind; label: string; start: string; end: string };
type Props = { steps: Step[]; timeZone: string };

/** A sitting's steps as one horizontal bar (widths by minutes), with the steps in words for screen readers. */
export function StepStrip({ steps, timeZone }: Props) {
  const total = Math.max(
    1,
    steps.reduce((sum, s) => sum + minutesBetween(s.start, s.end), 0),
  );
  return (
    <div>
      <div aria-hidden="true" className="flex h-6 overflow-hidden rounded ring-1 ring-ink/20">
        {steps.map((step) => (
          <span
            key={step.start}
            title={`${stepKindLabels[step.kind]}: ${step.label}`}
            className={`flex items-center justify-center border-r border-white last:border-r-0 ${stepKindPattern[step.kind]}`}
            style={{ width: `${(minutesBetween(step.start, step.end) / total) * 100}%` }}
          >
            <span className="rounded bg-white/95 p-px text-ink">
              <StepKindIcon kind={step.kind} className="size-3" />
            </span>
          </span>
        ))}
      </div>
      <ol className="sr-only">
        {steps.map((step) => (
          <li key={step.start}>
            {stepKindLabels[step.kind]}: {step.label}, {formatRange(step.start, step.end, formatFor(timeZone))}
          </li>
        ))}
      </ol>
    </div>
  );
}
