import { Link } from 'react-router-dom';
import { BookingStatusBadge } from '@client/components/ui/booking-status-badge';
import { SkinTestFlag } from '@client/components/ui/skin-test-flag';
import { DepositBadge } from '@client/components/ui/deposit-badge';
import { sittingLabel } from '@client/lib/booking-labels';
import { formatRange } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import type { PlacedSitting } from '../lay-out-day';
import { StepSegment } from './step-segment';
import { PX_PER_MIN } from './timeline-scale';

type Props = { placed: PlacedSitting; firstHour: number; timeZone: string; currency: string; roomy: boolean; href?: string };

/**
 * A sitting on the timeline: a strip of its steps (patterns) beside the words
 * (client, service, sitting, times), so no text sits on a pattern.
 */
export function SittingBlock({ placed, firstHour, timeZone, currency, roomy, href }: Props) {
  const { booking, sitting, startMin, endMin, lane, lanes } = placed;
  const times = formatRange(sitting.start, sitting.end, formatFor(timeZone));
  const ofLabel = sittingLabel(sitting.seq, sitting.of);
  const dimmed = booking.status === 'no_show' || booking.status === 'held';
  return (
    <article
      aria-label={`${booking.client.name}, ${booking.service.name}, ${times}`}
      title={`${booking.client.name} · ${booking.service.name} · ${times}`}
      className={`absolute flex overflow-hidden rounded-lg bg-white shadow-sm ring-1 ring-ink/25 ${dimmed ? 'opacity-80' : ''}`}
      style={{
        top: (startMin - firstHour * 60) * PX_PER_MIN,
        height: (endMin - startMin) * PX_PER_MIN,
        left: `calc(${(lane / lanes) * 100}% + 2px)`,
        width: `calc(${100 / lanes}% - 4px)`,
      }}
    >
      <ul aria-label="Steps" className={`relative shrink-0 ${roomy ? 'w-1/2' : 'w-9'}`}>
        {sitting.steps.map((step) => (
          <StepSegment key={step.start} step={step} sittingStart={sitting.start} timeZone={timeZone} showLabel={roomy} />
        ))}
      </ul>
      <div className="min-w-0 flex-1 px-2 py-1 text-xs leading-snug">
        <p className="truncate text-sm font-bold">
          {href ? (
            <Link to={href} className="text-link">
              {booking.client.name}
            </Link>
          ) : (
            booking.client.name
          )}
        </p>
        <p className="truncate">{booking.service.name}</p>
        {ofLabel && <p className="font-bold">{ofLabel}</p>}
        <p className="tabular">{times}</p>
        <p className="truncate">{sitting.chairName}</p>
        {booking.status !== 'booked' && <BookingStatusBadge status={booking.status} />}
        <SkinTestFlag skinTest={booking.skinTest} />
        {sitting.seq === 1 && <DepositBadge deposit={booking.deposit} currency={currency} />}
      </div>
    </article>
  );
}
