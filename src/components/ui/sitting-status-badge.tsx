import type { SittingStatus } from '@shared/schemas/day-of-service.schemas';
import { sittingStatusLabels } from '@client/lib/booking-labels';

// Text carries the meaning; the border only adds emphasis.
const looks: Record<SittingStatus, string> = {
  booked: 'border-sage',
  arrived: 'border-oxide',
  in_progress: 'border-oxide',
  finished: 'border-ink/40',
  no_show: 'border-brick text-brick',
};

type Props = { status: SittingStatus; lateMinutes?: number | null };

/** A sitting's status on the day, with the minutes late of an arrival. */
export function SittingStatusBadge({ status, lateMinutes }: Props) {
  return (
    <span className={`inline-block rounded-full border-2 bg-white px-2 py-0.5 text-xs font-bold ${looks[status]}`}>
      {sittingStatusLabels[status]}
      {lateMinutes ? ` · ${lateMinutes} min late` : ''}
    </span>
  );
}
