import { Link } from 'react-router-dom';
import { stepKindPattern } from '@client/components/ui/step-kind-swatch';
import { paths } from '@client/config/paths';
import { sittingLabel } from '@client/lib/booking-labels';
import { minutesBetween } from '@client/lib/time';
import type { WeekEventData } from '../week-events';

/** `showStylist`: in the week of all stylists, each sitting says whose it is. */
type Props = { data: WeekEventData; timeText: string; showStylist: boolean };

/** A sitting in the week calendar: its steps as a patterned strip, and who, what, which sitting. */
export function WeekEventContent({ data, timeText, showStylist }: Props) {
  const total = Math.max(
    1,
    data.steps.reduce((t, s) => t + minutesBetween(s.start, s.end), 0),
  );
  const ofLabel = sittingLabel(data.seq, data.of);
  return (
    <div className="flex h-full overflow-hidden text-ink">
      <div aria-hidden="true" className="flex w-3 shrink-0 flex-col">
        {data.steps.map((step) => (
          <span key={step.start} className={stepKindPattern[step.kind]} style={{ height: `${(minutesBetween(step.start, step.end) / total) * 100}%` }} />
        ))}
      </div>
      <div className="min-w-0 flex-1 px-1 text-xs leading-snug">
        <p className="truncate font-bold">
          {/* At least 24 px tall: events sit close together, and a smaller link is hard to hit (WCAG 2.2 target size). */}
          <Link to={paths.deskBooking(data.bookingId)} className="text-link inline-block min-h-6 max-w-full truncate align-top leading-6">
            {data.clientName}
          </Link>
        </p>
        {showStylist && <p className="truncate font-bold">{data.stylistName}</p>}
        <p className="truncate">{data.serviceName}</p>
        {ofLabel && <p className="font-bold">{ofLabel}</p>}
        <p className="tabular">{timeText}</p>
        <p className="truncate">{data.chairName}</p>
      </div>
    </div>
  );
}
