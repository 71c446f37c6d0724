import type { BookingView, WeekView } from '@shared/schemas/booking-view.schemas';
import type { StepKind } from '@shared/schemas/common.schemas';
import { toCalendarTime } from './calendar-time';

/** What a week-calendar event carries besides its times: enough to draw it, to move it and to move it back. */
export type WeekEventData = {
  bookingId: string;
  seq: number;
  of: number;
  clientName: string;
  serviceName: string;
  stylistId: string;
  stylistName: string;
  chairId: string;
  chairName: string;
  /** The sitting's real start (ISO with offset): where an undo puts it back. */
  start: string;
  steps: { kind: StepKind; label: string; start: string; end: string }[];
};

export type WeekEvent = { id: string; start: string; end: string; editable: boolean; extendedProps: WeekEventData };
/** A grey stretch when the salon is closed (FullCalendar background event, not draggable, not a booking). */
export type ClosedStretch = { id: string; start: string; end: string; display: 'background'; classNames: string[] };

const movable = (b: BookingView) => b.status === 'booked' || b.status === 'held';

/** One calendar event per sitting of the week (one stylist's, or everyone's when `stylistId` is null), in salon wall-clock time dressed as UTC. */
export function toWeekEvents(week: WeekView, stylistId: string | null): WeekEvent[] {
  const zone = week.timeZone;
  return week.bookings
    .filter((b) => (stylistId === null || b.stylist.id === stylistId) && b.status !== 'cancelled')
    .flatMap((booking) =>
      booking.sittings.map((sitting) => ({
        id: `${booking.id}:${sitting.seq}`,
        start: toCalendarTime(sitting.start, zone),
        end: toCalendarTime(sitting.end, zone),
        editable: movable(booking),
        extendedProps: {
          bookingId: booking.id,
          seq: sitting.seq,
          of: sitting.of,
          clientName: booking.client.name,
          serviceName: booking.service.name,
          stylistId: booking.stylist.id,
          stylistName: booking.stylist.name,
          chairId: sitting.chairId,
          chairName: sitting.chairName,
          start: sitting.start,
          steps: sitting.steps.map((s) => ({ kind: s.kind, label: s.label, start: s.start, end: s.end })),
        },
      })),
    );
}

const minutesOf = (hhmm: string) => Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3, 5));
const clock = (minutes: number) => `${String(Math.floor(minutes / 60)).padStart(2, '0')}:${String(minutes % 60).padStart(2, '0')}:00`;
/** Minutes from midnight of a calendar time (UTC fields = salon wall clock); an end at the next midnight is 24:00. */
const calendarMinutes = (iso: string, date: string) => (iso.slice(0, 10) > date ? 24 * 60 : minutesOf(iso.slice(11, 16)));

/** Nothing open and nothing booked all week: the hours of an ordinary working day, so the grid is not empty. */
const CLOSED_WEEK = { from: 9 * 60, to: 17 * 60 };

/**
 * The hours the calendar shows: from the earliest opening to the latest closing of the week (the salon's hours),
 * widened to whole hours that fit every sitting.
 */
export function visibleHours(week: Pick<WeekView, 'days'>, events: WeekEvent[]): { from: string; to: string } {
  const open = week.days.flatMap((d) => d.hours);
  const starts = [...open.map((h) => minutesOf(h.start)), ...events.map((e) => calendarMinutes(e.start, e.start.slice(0, 10)))];
  const ends = [...open.map((h) => minutesOf(h.end)), ...events.map((e) => calendarMinutes(e.end, e.start.slice(0, 10)))];
  const from = starts.length ? Math.floor(Math.min(...starts) / 60) * 60 : CLOSED_WEEK.from;
  const to = ends.length ? Math.min(24 * 60, Math.ceil(Math.max(...ends) / 60) * 60) : CLOSED_WEEK.to;
  return { from: clock(from), to: clock(Math.max(to, from + 60)) };
}

/** The dates of the week the salon does not open at all (closed weekdays and closed dates). */
export function closedDates(week: Pick<WeekView, 'days'>): Set<string> {
  return new Set(week.days.filter((d) => d.hours.length === 0).map((d) => d.date));
}

/**
 * The closed dates with nothing on them: left out of the grid to give the open days the room (a closed date that
 * still holds a sitting stays, greyed). Never every date: an empty week still shows its grid.
 */
export function hiddenClosedDates(week: Pick<WeekView, 'days'>, events: WeekEvent[]): string[] {
  const used = new Set(events.map((e) => e.start.slice(0, 10)));
  const hidden = [...closedDates(week)].filter((d) => !used.has(d));
  return hidden.length < week.days.length ? hidden : [];
}

/**
 * Grey stretches for the times of each open date outside its opening hours (a late opening, an early close, a
 * break), within the hours shown. Whole closed dates are greyed as columns instead.
 */
export function closedStretches(week: Pick<WeekView, 'days'>, shown: { from: string; to: string }): ClosedStretch[] {
  const first = minutesOf(shown.from);
  const last = minutesOf(shown.to);
  const at = (date: string, minutes: number) => (minutes >= 24 * 60 ? `${date}T23:59:59Z` : `${date}T${clock(minutes)}Z`);
  return week.days
    .filter((d) => d.hours.length > 0)
    .flatMap((d) => {
      const out: ClosedStretch[] = [];
      let cursor = first;
      for (const h of [...d.hours].sort((a, b) => a.start.localeCompare(b.start))) {
        if (minutesOf(h.start) > cursor)
          out.push({
            id: `closed:${d.date}:${cursor}`,
            start: at(d.date, cursor),
            end: at(d.date, minutesOf(h.start)),
            display: 'background',
            classNames: ['salon-closed'],
          });
        cursor = Math.max(cursor, minutesOf(h.end));
      }
      if (cursor < last)
        out.push({ id: `closed:${d.date}:${cursor}`, start: at(d.date, cursor), end: at(d.date, last), display: 'background', classNames: ['salon-closed'] });
      return out;
    });
}
