import type { EventDropArg } from '@fullcalendar/core';
import interactionPlugin from '@fullcalendar/interaction';
import FullCalendar from '@fullcalendar/react';
import timeGridPlugin from '@fullcalendar/timegrid';
import { DateTime } from 'luxon';
import { useMemo } from 'react';
import type { WeekView } from '@shared/schemas/booking-view.schemas';
import { fromCalendarTime, toCalendarTime } from '../calendar-time';
import { closedDates, closedStretches, hiddenClosedDates, toWeekEvents, visibleHours, type WeekEventData } from '../week-events';
import { WeekEventContent } from './week-event-content';
import { formatDate } from '@shared/format/date-time';
import { zonelessFormat } from '@shared/format/locale';
import './week-calendar.css';

/** A drag the server should check: the sitting, its new start, and the sitting as it was (for the answer and an undo). */
export type WeekDrop = { bookingId: string; sitting: number; start: string; was: WeekEventData };

type Props = {
  week: WeekView;
  /** One stylist's week, or null for every stylist's (each sitting then names its stylist). */
  stylistId: string | null;
  /** Resolves when the server accepts the move; rejects (and the event goes back) when it refuses. */
  onMove: (drop: WeekDrop) => Promise<unknown>;
};

const dateOf = (date: Date) => date.toISOString().slice(0, 10);

/**
 * A week as a time grid over the salon's opening hours, closed days and hours in grey; drag a sitting to move it.
 * The grid runs in UTC on salon wall-clock times (see calendar-time.ts), so it shows salon time on any device.
 */
export default function WeekCalendar({ week, stylistId, onMove }: Props) {
  const events = useMemo(() => toWeekEvents(week, stylistId), [week, stylistId]);
  const hours = useMemo(() => visibleHours(week, events), [week, events]);
  const closed = useMemo(() => closedDates(week), [week]);
  const background = useMemo(() => closedStretches(week, hours), [week, hours]);
  const hidden = useMemo(() => hiddenClosedDates(week, events), [week, events]);
  // The week holds each weekday once, so hiding a weekday hides exactly that date (FullCalendar: 0 = Sunday).
  const hiddenDays = hidden.map((date) => new Date(`${date}T00:00:00Z`).getUTCDay());
  const drop = (info: EventDropArg) => {
    const data = info.event.extendedProps as WeekEventData;
    if (!info.event.start) return info.revert();
    onMove({ bookingId: data.bookingId, sitting: data.seq, start: fromCalendarTime(info.event.start, week.timeZone), was: data }).catch(() => info.revert());
  };
  return (
    <div className={`dwell-week ${stylistId ? '' : 'dwell-week-all'} overflow-x-auto rounded-2xl bg-white p-2 ring-1 ring-ink/10`}>
      {hidden.length > 0 && (
        <p className="px-2 pb-2 text-sm">Closed, not shown: {hidden.map((d) => formatDate(d, zonelessFormat, { width: 'short', year: false })).join('; ')}.</p>
      )}
      <div className={stylistId ? 'min-w-[48rem]' : 'min-w-[56rem]'}>
        <FullCalendar
          key={`${week.from}-${stylistId ?? 'all'}`}
          plugins={[timeGridPlugin, interactionPlugin]}
          initialView="timeGridWeek"
          initialDate={week.from}
          timeZone="UTC"
          now={() => toCalendarTime(DateTime.now().toISO() ?? '', week.timeZone)}
          firstDay={1}
          headerToolbar={false}
          allDaySlot={false}
          hiddenDays={hiddenDays}
          slotEventOverlap={false}
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
          dayHeaderContent={(arg) => (
            <>
              {arg.text}
              {closed.has(dateOf(arg.date)) && <span className="block text-xs font-normal">Closed</span>}
            </>
          )}
          dayCellClassNames={(arg) => (closed.has(dateOf(arg.date)) ? ['salon-closed'] : [])}
          slotLabelFormat={{ hour: 'numeric', minute: '2-digit' }}
          eventTimeFormat={{ hour: 'numeric', minute: '2-digit' }}
          events={[...events, ...background]}
          eventContent={(arg) =>
            arg.event.display === 'background' ? null : (
              <WeekEventContent data={arg.event.extendedProps as WeekEventData} timeText={arg.timeText} showStylist={stylistId === null} />
            )
          }
          eventDrop={drop}
        />
      </div>
    </div>
  );
}
