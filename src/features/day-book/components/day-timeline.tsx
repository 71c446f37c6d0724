import { useMemo } from 'react';
import type { DayView } from '../../../../shared/schemas/booking-view.schemas';
import { layOutDay } from '../lay-out-day';
import { HourAxis } from './hour-axis';
import { StylistColumn } from './stylist-column';

type Props = { day: DayView };

/** The day as columns of time, one per stylist, each sitting drawn with its steps. */
export default function DayTimeline({ day }: Props) {
  const layout = useMemo(() => layOutDay(day), [day]);
  const roomy = layout.columns.length === 1;
  return (
    <div>
      <div role="region" aria-label="Day timeline" tabIndex={0} className="overflow-x-auto rounded-2xl bg-white ring-1 ring-ink/10">
        <div className="flex min-w-fit pb-4">
          <HourAxis firstHour={layout.firstHour} lastHour={layout.lastHour} date={day.date} timeZone={day.timeZone} />
          {layout.columns.map((column) => (
            <StylistColumn
              key={column.stylist.id}
              name={column.stylist.name}
              sittings={column.sittings}
              firstHour={layout.firstHour}
              lastHour={layout.lastHour}
              timeZone={day.timeZone}
              roomy={roomy}
            />
          ))}
        </div>
      </div>
      {layout.columns.length === 0 && <p className="mt-3">Nobody is on the book this day.</p>}
      {layout.hiddenCancelled > 0 && (
        <p className="mt-3 text-sm text-ink/80">
          {layout.hiddenCancelled} cancelled {layout.hiddenCancelled === 1 ? 'booking is' : 'bookings are'} not shown.
        </p>
      )}
    </div>
  );
}
