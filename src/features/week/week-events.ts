import type { BookingView, WeekView } from '../../../shared/schemas/booking-view.schemas';
import type { StepKind } from '../../../shared/schemas/common.schemas';
import { toCalendarTime } from './calendar-time';

/** What a week-calendar event carries besides its times: enough to draw it and to move it. */
export type WeekEventData = {
  bookingId: string;
  seq: number;
  of: number;
  clientName: string;
  serviceName: string;
  chairName: string;
  steps: { kind: StepKind; label: string; start: string; end: string }[];
};

export type WeekEvent = { id: string; start: string; end: string; editable: boolean; extendedProps: WeekEventData };

const movable = (b: BookingView) => b.status === 'booked' || b.status === 'held';

/** One calendar event per sitting of the stylist's week, in salon wall-clock time dressed as UTC. */
export function toWeekEvents(week: WeekView, stylistId: string): WeekEvent[] {
  const zone = week.timeZone;
  return week.bookings
    .filter((b) => b.stylist.id === stylistId && b.status !== 'cancelled')
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
          chairName: sitting.chairName,
          steps: sitting.steps.map((s) => ({ kind: s.kind, label: s.label, start: s.start, end: s.end })),
        },
      })),
    );
}

/** The hours the calendar shows: 08:00–19:00 at least, widened to fit every event. */
export function visibleHours(events: WeekEvent[]): { from: string; to: string } {
  const hours = events.flatMap((e) => [Number(e.start.slice(11, 13)), Math.ceil(Number(e.end.slice(11, 13)) + Number(e.end.slice(14, 16)) / 60)]);
  const from = Math.min(8, ...hours);
  const to = Math.min(24, Math.max(19, ...hours));
  const pad = (h: number) => `${String(h).padStart(2, '0')}:00:00`;
  return { from: pad(from), to: pad(to) };
}
