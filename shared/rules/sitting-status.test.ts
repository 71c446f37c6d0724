import { describe, expect, it } from 'vitest';
import { bookingStatusFor, lateMinutes, noShowFrom } from './sitting-status';

describe('bookingStatusFor', () => {
  it('is checked in while any sitting has arrived or is under way', () => {
    expect(bookingStatusFor(['arrived'])).toBe('checked_in');
    expect(bookingStatusFor(['finished', 'in_progress'])).toBe('checked_in');
  });
  it('is booked while a sitting is still to come (between sittings of a correction, or after a missed one)', () => {
    expect(bookingStatusFor(['booked'])).toBe('booked');
    expect(bookingStatusFor(['finished', 'booked'])).toBe('booked');
    expect(bookingStatusFor(['no_show', 'booked'])).toBe('booked');
  });
  it('once none is to come: finished if any sitting was, else a no-show', () => {
    expect(bookingStatusFor(['finished', 'finished'])).toBe('finished');
    expect(bookingStatusFor(['finished', 'no_show'])).toBe('finished');
    expect(bookingStatusFor(['no_show'])).toBe('no_show');
  });
});

describe('lateMinutes and noShowFrom', () => {
  const planned = new Date('2027-03-02T16:00:00Z');
  it('counts whole minutes after the planned start, none when early', () => {
    expect(lateMinutes(planned, new Date('2027-03-02T16:12:59Z'))).toBe(12);
    expect(lateMinutes(planned, new Date('2027-03-02T15:50:00Z'))).toBe(0);
  });
  it('allows a no-show from the planned start plus the grace minutes', () => {
    expect(noShowFrom(planned, 15).toISOString()).toBe('2027-03-02T16:15:00.000Z');
  });
});
