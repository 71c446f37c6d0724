import type { EventDropArg } from '@fullcalendar/core';
import interactionPlugin from '@fullcalendar/interaction';
import FullCalendar from '@fullcalendar/react';
import timeGridPlugin from '@fullcalendar/timegrid';
import { DateTime } from 'luxon';
import { useMemo } from 'react';
import type { WeekView } from '../../../../shared/schemas/booking-view.schemas';
import { fromCalendarTime, toCalendarTime } from '../calendar-time';
import { toWeekEvents, visibleHours, type WeekEventData } from '../week-events';
import { WeekEventContent } from './week-event-content';
import './week-calendar.css';

type Props = {
  week: WeekView;
  stylistId: string;
  /** Resolves when the server accepts the move; rejects (and the event goes back) when it refuses. */
  onMove: (move: { bookingId: string; sitting: number; start: string }) => Promise<unknown>;
};

/**
 * One stylist's week as a time grid; drag a sitting to move it. The grid runs in UTC
 * on salon wall-clock times (see calendar-time.ts), so it shows salon time on any device.
 */
export default function WeekCalendar({ week, stylistId, onMove }: Props) {
  const events = useMemo(() => toWeekEvents(week, stylistId), [week, stylistId]);
  const hours = visibleHours(events);
  const drop = (info: EventDropArg) => {
    const data = info.event.extendedProps as WeekEventData;
    if (!info.event.start) return info.revert();
    onMove({ bookingId: data.bookingId, sitting: data.seq, start: fromCalendarTime(info.event.start, week.timeZone) }).catch(() => info.revert());
  };
  return (
    <div className="dwell-week overflow-x-auto rounded-2xl bg-white p-2 ring-1 ring-ink/10">
      <div className="min-w-[48rem]">
        <FullCalendar
          key={`${week.from}-${stylistId}`}
          plugins={[timeGridPlugin, interactionPlugin]}
          initialView="timeGridWeek"
          initialDate={week.from}
          timeZone="UTC"
          now={() => toCalendarTime(DateTime.now().toISO() ?? '', week.timeZone)}
          firstDay={1}
          headerToolbar={false}
          allDaySlot={false}
          height="auto"
          slotMinTime={hours.from}
          slotMaxTime={hours.to}
          slotDuration="00:30:00"
          snapDuration="00:15:00"
          nowIndicator
          editable
          eventDurationEditable={false}
          eventStartEditable
          dayHeaderFormat={{ weekday: 'short', day: 'numeric', month: 'short' }}
          slotLabelFormat={{ hour: 'numeric', minute: '2-digit' }}
          eventTimeFormat={{ hour: 'numeric', minute: '2-digit' }}
          events={events}
          eventContent={(arg) => <WeekEventContent data={arg.event.extendedProps as WeekEventData} timeText={arg.timeText} />}
          eventDrop={drop}
        />
      </div>
    </div>
  );
}
