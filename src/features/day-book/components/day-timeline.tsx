import { useMemo } from 'react';
import type { DayView } from '../../../../shared/schemas/booking-view.schemas';
import type { HandsFreeWindowView } from '../../../../shared/schemas/window.schemas';
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
  return (
    <div>
      {layout.closed && <p className="mb-3 font-bold">The salon is closed on this date.</p>}
      <div role="region" aria-label={by === 'chair' ? 'Chair timeline' : 'Day timeline'} tabIndex={0} className="overflow-x-auto rounded-2xl bg-white ring-1 ring-ink/10">
        <div className="flex min-w-fit pb-4">
          <HourAxis firstHour={layout.firstHour} lastHour={layout.lastHour} date={day.date} timeZone={day.timeZone} />
          {layout.columns.map((column) => (
            <StylistColumn
              key={column.id}
              name={column.name}
              sittings={column.sittings}
              firstHour={layout.firstHour}
              lastHour={layout.lastHour}
              date={day.date}
              timeZone={day.timeZone}
              roomy={roomy}
              windows={by === 'stylist' ? windows.filter((w) => w.stylistId === column.id) : []}
              closedSpans={layout.closedSpans}
              bookingHref={bookingHref}
            />
          ))}
        </div>
      </div>
      {layout.columns.length === 0 && <p className="mt-3">{by === 'chair' ? 'No chairs are set up.' : 'Nobody is on the book this day.'}</p>}
      {layout.hiddenCancelled > 0 && (
        <p className="mt-3 text-sm text-ink/80">
          {layout.hiddenCancelled} cancelled {layout.hiddenCancelled === 1 ? 'booking is' : 'bookings are'} not shown.
        </p>
      )}
    </div>
  );
}
