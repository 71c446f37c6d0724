import { useMemo } from 'react';
import type { DayView } from '@shared/schemas/booking-view.schemas';
import { visitsOn } from '@client/lib/day-visits';
import { useNow } from '@client/lib/use-now';
import { AlertsSwitch } from '@client/features/day-of-service';
import { useDayRun } from '@client/features/replan';
import { ClientDayCard } from './client-day-card';

type Props = { day: DayView };

/** The stylist's clients of the day in the order they sit down. */
export function MyClients({ day }: Props) {
  const now = useNow();
  const runOf = useDayRun(day.date);
  const visits = useMemo(() => visitsOn(day, (b) => b.status !== 'cancelled' && b.status !== 'no_show'), [day]);
  if (visits.length === 0) return <p>No clients on this day.</p>;
  return (
    <div className="flex flex-col gap-4">
      <AlertsSwitch />
      <ol className="grid gap-4 lg:grid-cols-2">
        {visits.map(({ booking, sitting }) => (
          <li key={`${booking.id}-${sitting.seq}`}>
            <ClientDayCard booking={booking} sitting={sitting} run={runOf(booking.id, sitting.seq)} timeZone={day.timeZone} now={now} />
          </li>
        ))}
      </ol>
    </div>
  );
}
