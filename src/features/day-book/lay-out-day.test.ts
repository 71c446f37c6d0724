import { describe, expect, it } from 'vitest';
import type { BookingView, DayView } from '@shared/schemas/booking-view.schemas';
import { layOutDay } from './lay-out-day';

// A sitting not run yet (booked, no arrival); the fixtures' times are what these tests are about.
const dayState = { status: 'booked', arrivedAt: null, lateMinutes: null, noShowFrom: '2027-03-02T00:00:00Z' } as const;

const id = (n: number) => `00000000-0000-4000-8000-00000000000${n}`;
const booking = (n: number, stylist: number, chair: number, from: string, to: string): BookingView => ({
  id: id(n),
  status: 'booked',
  client: { id: id(n), name: `Client ${n}` },
  service: { id: id(1), name: 'Toner' },
  stylist: { id: id(stylist), name: `Stylist ${stylist}` },
  priceCents: 0,
  skinTest: { status: 'not_needed', message: '' },
  stepPlan: { sittings: [] },
  depositCents: 0,
  depositOutcome: null,
  deposit: { status: 'none', paidCents: 0, dueCents: 0, dueBy: null },
  cancelReason: null,
  sittings: [
    { seq: 1, of: 1, chairId: id(chair), chairName: `Chair ${chair}`, start: `2027-03-02T${from}:00Z`, end: `2027-03-02T${to}:00Z`, steps: [], ...dayState },
  ],
});
const day: DayView = {
  date: '2027-03-02',
  timeZone: 'UTC',
  currency: 'USD',
  hours: [{ start: '09:00', end: '21:00' }],
  stylists: [
    { id: id(1), name: 'Stylist 1', skills: [] },
    { id: id(2), name: 'Stylist 2', skills: [] },
  ],
  chairs: [
    { id: id(7), name: 'Chair 7' },
    { id: id(8), name: 'Chair 8' },
  ],
  bookings: [booking(3, 1, 7, '09:00', '11:00'), booking(4, 2, 7, '12:00', '13:00'), booking(5, 1, 8, '10:00', '10:30')],
};

describe('layOutDay', () => {
  it('puts each sitting in its stylist column, overlapping ones side by side', () => {
    const layout = layOutDay(day);
    expect(layout.columns.map((c) => [c.name, c.sittings.length])).toEqual([
      ['Stylist 1', 2],
      ['Stylist 2', 1],
    ]);
    expect(layout.columns[0]!.sittings.map((s) => [s.lane, s.lanes])).toEqual([
      [0, 2],
      [1, 2],
    ]);
  });

  it('in the chair view, groups the same sittings by chair', () => {
    const layout = layOutDay(day, 'chair');
    expect(layout.columns.map((c) => [c.name, c.sittings.map((s) => s.booking.client.name)])).toEqual([
      ['Chair 7', ['Client 3', 'Client 4']],
      ['Chair 8', ['Client 5']],
    ]);
  });

  it('covers the opening hours even when the bookings end early, and greys what lies outside them', () => {
    // Open 09:00–21:00, bookings 09:00–13:00: the timeline still runs to 9 PM (the closing time), not to the last booking.
    expect(layOutDay(day)).toMatchObject({ firstHour: 9, lastHour: 21, closed: false, closedSpans: [] });
    const late = {
      ...day,
      hours: [
        { start: '10:00', end: '14:00' },
        { start: '15:00', end: '19:30' },
      ],
    };
    // A 09:00 sitting before a 10:00 opening widens the timeline; the gaps and the half hour to 20:00 are closed.
    expect(layOutDay(late)).toMatchObject({
      firstHour: 9,
      lastHour: 20,
      closedSpans: [
        { fromMin: 540, toMin: 600 },
        { fromMin: 840, toMin: 900 },
        { fromMin: 1170, toMin: 1200 },
      ],
    });
  });

  it('says a closed date is closed, and still shows a booking left on it', () => {
    expect(layOutDay({ ...day, hours: [], bookings: [] })).toMatchObject({ closed: true, firstHour: 9, lastHour: 17 });
    expect(layOutDay({ ...day, hours: [] })).toMatchObject({ closed: true, firstHour: 9, lastHour: 13, closedSpans: [{ fromMin: 540, toMin: 780 }] });
  });
});
