import type { BookingStatus } from '@shared/schemas/common.schemas';
import { bookingStatusLabels } from '@client/lib/booking-labels';

// Text carries the meaning; the border only adds emphasis.
const looks: Record<BookingStatus, string> = {
  held: 'border-amber',
  booked: 'border-sage',
  checked_in: 'border-oxide',
  finished: 'border-ink/40',
  checked_out: 'border-ink',
  cancelled: 'border-brick text-brick',
  no_show: 'border-brick text-brick',
};

type Props = { status: BookingStatus };

export function BookingStatusBadge({ status }: Props) {
  return <span className={`inline-block rounded-full border-2 bg-white px-2 py-0.5 text-xs font-bold ${looks[status]}`}>{bookingStatusLabels[status]}</span>;
}
