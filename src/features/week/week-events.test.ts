import { describe, expect, it } from 'vitest';
import type { BookingView, WeekView } from '@shared/schemas/booking-view.schemas';
import { closedDates, closedStretches, hiddenClosedDates, toWeekEvents, visibleHours } from './week-events';

// A sitting not run yet (booked, no arrival); the fixtures' times are what these tests are about.
const dayState = { status: 'booked', arrivedAt: null, lateMinutes: null, noShowFrom: '2027-03-02T00:00:00Z' } as const;

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
  deposit: { status: 'none', paidCents: 0, dueCents: 0, dueBy: null },
  cancelReason: null,
  sittings: [
    { seq: 1, of: 2, chairId: id(7), chairName: 'Chair 1', start: '2027-03-08T16:00:00Z', end: '2027-03-09T01:00:00Z', steps: [], ...dayState },
    { seq: 2, of: 2, chairId: id(7), chairName: 'Chair 1', start: '2027-03-15T15:00:00Z', end: '2027-03-15T20:00:00Z', steps: [], ...dayState },
  ],
});
const week: WeekView = {
  from: '2027-03-08',
  to: '2027-03-14',
  timeZone: 'America/Denver',
  // Open Tuesday to Saturday 09:00–21:00, Saturday until 17:00; 8 March 2027 is a Monday, 14 March a Sunday.
  days: ['2027-03-08', '2027-03-09', '2027-03-10', '2027-03-11', '2027-03-12', '2027-03-13', '2027-03-14'].map((date, i) => ({
    date,
    hours: i === 0 || i === 6 ? [] : [{ start: '09:00', end: i === 5 ? '17:00' : '21:00' }],
  })),
  stylists: [],
  bookings: [booking(3, 1, 'booked'), booking(4, 2, 'booked'), booking(5, 1, 'cancelled'), booking(6, 1, 'finished')],
};

describe('toWeekEvents', () => {
  const events = toWeekEvents(week, id(1));

  it('keeps the stylist’s sittings that are not cancelled, one event per sitting, with its number', () => {
    expect(events.map((e) => e.id)).toEqual([`${id(3)}:1`, `${id(3)}:2`, `${id(6)}:1`, `${id(6)}:2`]);
    expect(events[1]!.extendedProps).toMatchObject({ seq: 2, of: 2, clientName: 'Client 3' });
  });

  it('uses salon wall-clock times on both sides of the change to summer time', () => {
    expect(events[0]).toMatchObject({ start: '2027-03-08T09:00:00Z', end: '2027-03-08T18:00:00Z' });
    expect(events[1]).toMatchObject({ start: '2027-03-15T09:00:00Z', end: '2027-03-15T14:00:00Z' });
  });

  it('lets only booked or held bookings be dragged', () => {
    expect(events.map((e) => e.editable)).toEqual([true, true, false, false]);
  });
});

describe('toWeekEvents for all stylists', () => {
  it('keeps every stylist’s sittings, each naming its stylist', () => {
    const all = toWeekEvents(week, null);
    expect(all.map((e) => e.id)).toEqual([`${id(3)}:1`, `${id(3)}:2`, `${id(4)}:1`, `${id(4)}:2`, `${id(6)}:1`, `${id(6)}:2`]);
    expect(all[0]!.extendedProps).toMatchObject({ stylistName: 'Ana', chairId: id(7), start: '2027-03-08T16:00:00Z' });
  });
});

describe('visibleHours', () => {
  it('runs from the earliest opening to the latest closing of the week, not to the last booking', () => {
    // Open until 21:00 (9 PM): the grid must reach 9 PM though the week's sittings end at 18:00.
    expect(visibleHours(week, toWeekEvents(week, id(1)))).toEqual({ from: '09:00:00', to: '21:00:00' });
  });

  it('widens to whole hours that fit a sitting outside the opening hours', () => {
    const early = toWeekEvents(week, id(1)).map((e) => ({ ...e, start: '2027-03-09T07:30:00Z', end: '2027-03-09T21:30:00Z' }));
    expect(visibleHours(week, early)).toEqual({ from: '07:00:00', to: '22:00:00' });
  });

  it('shows an ordinary working day when the salon is closed all week and nothing is booked', () => {
    expect(visibleHours({ days: week.days.map((d) => ({ ...d, hours: [] })) }, [])).toEqual({ from: '09:00:00', to: '17:00:00' });
  });
});

describe('closed dates and stretches', () => {
  it('names the dates the salon does not open', () => {
    expect([...closedDates(week)]).toEqual(['2027-03-08', '2027-03-14']);
  });

  it('greys Saturday after its 17:00 close, within the hours shown, and nothing on the full days', () => {
    expect(closedStretches(week, { from: '09:00:00', to: '21:00:00' })).toEqual([
      { id: 'closed:2027-03-13:1020', start: '2027-03-13T17:00:00Z', end: '2027-03-13T21:00:00Z', display: 'background', classNames: ['salon-closed'] },
    ]);
  });
});

describe('hiddenClosedDates', () => {
  it('leaves out the closed dates with nothing on them, and keeps one that holds a sitting', () => {
    expect(hiddenClosedDates(week, [])).toEqual(['2027-03-08', '2027-03-14']);
    // Client 3's first sitting is on Monday 8 March (a closed day): that day stays, greyed.
    expect(hiddenClosedDates(week, toWeekEvents(week, id(1)))).toEqual(['2027-03-14']);
  });

  it('never hides every date of a week the salon is closed all of', () => {
    expect(hiddenClosedDates({ days: week.days.map((d) => ({ ...d, hours: [] })) }, [])).toEqual([]);
  });
});
