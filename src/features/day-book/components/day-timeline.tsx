import { ClosedKey } from '@client/components/ui/closed-key';
import { useMemo } from 'react';
import type { DayView } from '@shared/schemas/booking-view.schemas';
import type { HandsFreeWindowView } from '@shared/schemas/window.schemas';
import { layOutDay, type ColumnsBy } from '../lay-out-day';
import { HourAxis } from './hour-axis';
import { StylistColumn } from './stylist-column';

type Props = {
  day: DayView;
  by?: ColumnsBy;
  windows?: HandsFreeWindowView[];
  bookingHref?: (bookingId: string) => string;
};

/** The day as columns of time, one per stylist (or chair), each sitting drawn with its steps. */
export default function DayTimeline({ day, by = 'stylist', windows = [], bookingHref }: Props) {
  const layout = useMemo(() => layOutDay(day, by), [day, by]);
  const roomy = layout.columns.length === 1;
  const booked = layout.columns.some((c) => c.sittings.length > 0);
  // A closed date with nothing on it is said in words; an empty grey grid would only look like a fault.
  if (layout.closed && !booked)
    return <p className="rounded-2xl bg-white p-4 font-bold ring-1 ring-ink/10">The salon is closed on this date. Nothing is booked.</p>;
  return (
    <div className="flex flex-col gap-3">
      {layout.closed && <p className="font-bold">The salon is closed on this date.</p>}
      {layout.closedSpans.length > 0 && <ClosedKey />}
      <div
        role="region"
        aria-label={by === 'chair' ? 'Chair timeline' : 'Day timeline'}
        tabIndex={0}
        className="overflow-x-auto rounded-2xl bg-white ring-1 ring-ink/10"
      >
        <div className="flex min-w-fit pb-4">
          <HourAxis firstHour={layout.firstHour} lastHour={layout.lastHour} timeZone={day.timeZone} />
          {layout.columns.map((column) => (
            <StylistColumn
              key={column.id}
              name={column.name}
              sittings={column.sittings}
              firstHour={layout.firstHour}
              lastHour={layout.lastHour}
              date={day.date}
              timeZone={day.timeZone}
              currency={day.currency}
              roomy={roomy}
              windows={by === 'stylist' ? windows.filter((w) => w.stylistId === column.id) : []}
              closedSpans={layout.closedSpans}
              bookingHref={bookingHref}
            />
          ))}
        </div>
      </div>
      {layout.columns.length === 0 && <p>{by === 'chair' ? 'No chairs are set up.' : 'Nobody is on the book this day.'}</p>}
      {layout.hiddenCancelled > 0 && (
        <p className="text-sm text-ink/80">
          {layout.hiddenCancelled} cancelled {layout.hiddenCancelled === 1 ? 'booking is' : 'bookings are'} not shown.
        </p>
      )}
    </div>
  );
}
