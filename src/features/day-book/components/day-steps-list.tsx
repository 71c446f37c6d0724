import { useMemo } from 'react';
import type { DayView } from '@shared/schemas/booking-view.schemas';
import { StepKindIcon } from '@client/components/ui/step-kind-icon';
import { StepKindSwatch } from '@client/components/ui/step-kind-swatch';
import { stepKindLabels } from '@client/lib/booking-labels';
import { formatRange } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { localDateOf } from '@shared/time/salon-time';

type Props = { day: DayView };

/** Every step of the day in time order, so a stylist sees what comes next and when their hands are free. */
export function DayStepsList({ day }: Props) {
  const steps = useMemo(
    () =>
      day.bookings
        .filter((booking) => booking.status !== 'cancelled')
        .flatMap((booking) =>
          booking.sittings
            .filter((sitting) => localDateOf(sitting.start, day.timeZone) === day.date)
            .flatMap((sitting) => sitting.steps.map((step) => ({ booking, step }))),
        )
        .sort((a, b) => a.step.start.localeCompare(b.step.start)),
    [day],
  );
  if (steps.length === 0) return <p>No client steps on this day.</p>;
  return (
    <ol className="divide-y divide-ink/10">
      {steps.map(({ booking, step }) => (
        <li key={`${booking.id}-${step.start}`} className="flex flex-wrap items-center gap-x-4 gap-y-1 py-2">
          <span className="w-44 tabular">{formatRange(step.start, step.end, formatFor(day.timeZone))}</span>
          <span className="flex w-36 items-center gap-2 font-bold">
            <StepKindSwatch kind={step.kind} />
            <StepKindIcon kind={step.kind} />
            {stepKindLabels[step.kind]}
          </span>
          <span className="min-w-40 flex-1">
            {step.label}
            {step.basinName && ` · ${step.basinName}`}
          </span>
          <span className="text-ink/80">
            {booking.client.name} — {booking.service.name}
          </span>
        </li>
      ))}
    </ol>
  );
}
