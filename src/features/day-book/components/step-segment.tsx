import type { z } from 'zod';
import type { StepViewSchema } from '@shared/schemas/booking-view.schemas';
import { StepKindIcon } from '@client/components/ui/step-kind-icon';
import { stepKindPattern } from '@client/components/ui/step-kind-swatch';
import { stepKindLabels } from '@client/lib/booking-labels';
import { minutesBetween } from '@client/lib/time';
import { formatRange } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { PX_PER_MIN } from './timeline-scale';

type Props = {
  step: z.output<typeof StepViewSchema>;
  sittingStart: string;
  timeZone: string;
  showLabel: boolean;
};

/** One step inside a sitting: its kind's pattern and icon, and the full words for screen readers. */
export function StepSegment({ step, sittingStart, timeZone, showLabel }: Props) {
  const top = minutesBetween(sittingStart, step.start) * PX_PER_MIN;
  const height = Math.max(minutesBetween(step.start, step.end) * PX_PER_MIN, 2);
  const times = formatRange(step.start, step.end, formatFor(timeZone));
  const where = step.basinName ? ` at ${step.basinName}` : '';
  return (
    <li
      className={`absolute inset-x-0 flex items-start gap-1 overflow-hidden border-b border-white/70 px-1 pt-0.5 text-xs ${stepKindPattern[step.kind]}`}
      style={{ top, height }}
    >
      {height >= 16 && (
        <span className="flex items-center gap-1 rounded bg-white/95 px-1 text-ink">
          <StepKindIcon kind={step.kind} className="size-3.5" />
          {showLabel && height >= 20 && (
            <span aria-hidden="true" className="truncate">
              {step.label}
            </span>
          )}
        </span>
      )}
      <span className="sr-only">
        {stepKindLabels[step.kind]}: {step.label}, {times}
        {where}
      </span>
    </li>
  );
}
