import { describe, expect, it } from 'vitest';
import type { BookingView, WeekView } from '../../../shared/schemas/booking-view.schemas';
import { toWeekEvents, visibleHours } from './week-events';

const id = (n: number) => `00000000-0000-4000-8000-00000000000${n}`;
const booking = (n: number, stylist: number, status: BookingView['status']): BookingView => ({
  id: id(n),
  status,
  client: { id: id(n), name: `Client ${n}` },
  service: { id: id(1), name: 'Colour correction' },
  stylist: { id: id(stylist), name: 'Ana' },
  priceCents: 0,
  skinTest: { status: 'not_needed', message: '' },
  stepPlan: { sittings: [] },
  depositCents: 0,
  depositOutcome: null,
  cancelReason: null,
  sittings: [
    { seq: 1, of: 2, chairId: id(7), chairName: 'Chair 1', start: '2027-03-08T16:00:00Z', end: '2027-03-09T01:00:00Z', steps: [] },
    { seq: 2, of: 2, chairId: id(7), chairName: 'Chair 1', start: '2027-03-15T15:00:00Z', end: '2027-03-15T20:00:00Z', steps: [] },
  ],
});
const week: WeekView = {
  from: '2027-03-08',
  to: '2027-03-14',
  timeZone: 'America/Denver',
  stylists: [],
  bookings: [booking(3, 1, 'booked'), booking(4, 2, 'booked'), booking(5, 1, 'cancelled'), booking(6, 1, 'finished')],
};

describe('toWeekEvents', () => {
  const events = toWeekEvents(week, id(1));

  it('keeps the stylist’s sittings that are not cancelled, one event per sitting, with its number', () => {
    expect(events.map((e) => e.id)).toEqual([`${id(3)}:1`, `${id(3)}:2`, `${id(6)}:1`, `${id(6)}:2`]);
    expect(events[1].extendedProps).toMatchObject({ seq: 2, of: 2, clientName: 'Client 3' });
  });

  it('uses salon wall-clock times on both sides of the change to summer time', () => {
    expect(events[0]).toMatchObject({ start: '2027-03-08T09:00:00Z', end: '2027-03-08T18:00:00Z' });
    expect(events[1]).toMatchObject({ start: '2027-03-15T09:00:00Z', end: '2027-03-15T14:00:00Z' });
  });

  it('lets only booked or held bookings be dragged', () => {
    expect(events.map((e) => e.editable)).toEqual([true, true, false, false]);
  });
});

describe('visibleHours', () => {
  it('widens the default hours to fit early and late events', () => {
    expect(visibleHours([])).toEqual({ from: '08:00:00', to: '19:00:00' });
    const early = toWeekEvents(week, id(1)).map((e) => ({ ...e, start: '2027-03-08T07:00:00Z', end: '2027-03-08T20:30:00Z' }));
    expect(visibleHours(early)).toEqual({ from: '07:00:00', to: '21:00:00' });
  });
});
