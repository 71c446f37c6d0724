import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import type { DayView } from '@shared/schemas/booking-view.schemas';
import { formatRange } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { AlertsSwitch } from '@client/features/day-of-service';
import { paths } from '@client/config/paths';
import { todayIn } from '@client/lib/time';
import { visitsOn } from '@client/lib/day-visits';
import { useNow } from '@client/lib/use-now';
import { DepositBadge } from '@client/components/ui/deposit-badge';
import { ArrivalRow } from './arrival-row';

type Props = { day: DayView };

/** Every sitting of the day in time order, with what the desk does as clients come in: Arrived, No-show, Undo. */
export function ArrivalsList({ day }: Props) {
  const now = useNow();
  const visits = useMemo(() => visitsOn(day, (b) => b.status !== 'cancelled' && b.status !== 'held'), [day]);
  if (visits.length === 0) return <p>No clients on this day.</p>;
  const today = day.date === todayIn(day.timeZone);
  return (
    <div className="flex flex-col gap-3">
      {today && <AlertsSwitch />}
      <ol className="divide-y divide-ink/10">
        {visits.map(({ booking, sitting }) => (
          <li key={`${booking.id}-${sitting.seq}`} className="py-3">
            <ArrivalRow booking={booking} sitting={sitting} timeZone={day.timeZone} now={now} today={today}>
              <span className="tabular">{formatRange(sitting.start, sitting.end, formatFor(day.timeZone))}</span>{' '}
              <Link to={paths.deskBooking(booking.id)} className="text-link font-bold">
                {booking.client.name}
              </Link>{' '}
              · {booking.service.name} · {booking.stylist.name} <DepositBadge deposit={booking.deposit} currency={day.currency} />
            </ArrivalRow>
          </li>
        ))}
      </ol>
    </div>
  );
}
