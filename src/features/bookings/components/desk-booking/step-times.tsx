import type { SittingView } from '@shared/schemas/booking-view.schemas';
import { formatRange, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { stepKindLabels } from '@client/lib/booking-labels';

type Props = { steps: SittingView['steps']; timeZone: string };

const minutes = (from: string, to: string) => Math.round((Date.parse(to) - Date.parse(from)) / 60_000);

/** Each step planned beside how it went: its actual start and end once tapped, and the minutes over or under the plan. */
export function StepTimes({ steps, timeZone }: Props) {
  const zone = formatFor(timeZone);
  return (
    <table className="text-sm">
      <caption className="sr-only">Steps planned and actual</caption>
      <thead>
        <tr className="text-left">
          <th scope="col" className="pr-4 font-bold">
            Step
          </th>
          <th scope="col" className="pr-4 font-bold">
            Planned
          </th>
          <th scope="col" className="font-bold">
            Actual
          </th>
        </tr>
      </thead>
      <tbody>
        {steps.map((step) => {
          const planned = minutes(step.start, step.end);
          const actual = step.actualStart && step.actualEnd ? minutes(step.actualStart, step.actualEnd) : null;
          return (
            <tr key={step.start} className="align-top">
              <td className="pr-4">
                {stepKindLabels[step.kind]}: {step.label}
                {step.basinName && ` · ${step.basinName}`}
                {step.minMinutes !== null && step.maxMinutes !== null && ` (${step.minMinutes}–${step.maxMinutes} min)`}
              </td>
              <td className="pr-4 tabular">{formatRange(step.start, step.end, zone)}</td>
              <td className="tabular">
                {!step.actualStart && 'Not started'}
                {step.actualStart && !step.actualEnd && `From ${formatTime(step.actualStart, zone)}, under way`}
                {step.actualStart && step.actualEnd && (
                  <>
                    {formatRange(step.actualStart, step.actualEnd, zone)} · {actual} min
                    {actual !== null && actual !== planned && ` (${actual > planned ? `${actual - planned} over` : `${planned - actual} under`} the plan)`}
                  </>
                )}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}
