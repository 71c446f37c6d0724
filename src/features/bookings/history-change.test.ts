import { describe, expect, it } from 'vitest';
import { actionLabel, describeBookingChange, describeChange, entryTitle, fieldLabel, valueText } from './history-change';

describe('describeChange', () => {
  it('lists only the values that changed, nested ones by path', () => {
    const before = { status: 'booked', sittings: [{ start: '2027-03-02T09:00:00-07:00', chair: 'A' }] };
    const after = { status: 'booked', sittings: [{ start: '2027-03-03T10:00:00-07:00', chair: 'A' }] };
    expect(describeChange(before, after)).toEqual([{ field: 'sittings.1.start', before: '2027-03-02T09:00:00-07:00', after: '2027-03-03T10:00:00-07:00' }]);
  });
  it('shows every field of a created record as new', () => {
    expect(describeChange(null, { status: 'booked' })).toEqual([{ field: 'status', before: undefined, after: 'booked' }]);
  });
});

describe('fieldLabel and valueText', () => {
  it('reads like words', () => {
    expect(fieldLabel('sittings.2.startTime')).toBe('Sitting 2 start time');
    expect(actionLabel('moved_sitting')).toBe('Moved sitting');
    expect(fieldLabel('depositOutcome')).toBe('Deposit outcome');
  });
  it('formats times with the given function and empties as a dash', () => {
    expect(valueText('2027-03-02T09:00:00Z', () => 'Tue 9:00')).toBe('Tue 9:00');
    expect(valueText(null, String)).toBe('—');
    expect(valueText(['a', 'b'], String)).toBe('a, b');
  });
});

describe('describeBookingChange (a booking’s history in the app’s words)', () => {
  // America/Denver is UTC−7 in December (MST, IANA tz database): 16:00Z is 9:00 AM, 21:10Z is 2:10 PM.
  const words = {
    timeZone: 'America/Denver',
    currency: 'USD',
    stylistName: (id: string) => (id === '6a87ef65-2e24-4309-ac67-413002e78490' ? 'Ana Moreno' : undefined),
  };
  const sitting1 = { sitting: 1, chair: 'Chair 1', start: '2026-12-01T16:00:00.000Z', end: '2026-12-01T21:10:00.000Z' };
  const sitting2 = { sitting: 2, chair: 'Chair 1', start: '2026-12-03T16:00:00.000Z', end: '2026-12-03T20:10:00.000Z' };

  it('names a moved sitting "Sitting 2 of 2" with its day, times in salon time and chair, not its stored fields', () => {
    const before = { status: 'booked', stylist: 'Ana Moreno', sittings: [sitting1, sitting2] };
    const after = { ...before, sittings: [sitting1, { ...sitting2, chair: 'Chair 3', start: '2026-12-04T17:00:00.000Z', end: '2026-12-04T21:10:00.000Z' }] };
    expect(describeBookingChange(before, after, words)).toEqual([
      { label: 'Sitting 2 of 2', before: 'Thu 3 Dec 2026, 9:00 AM – 1:10 PM · Chair 1', after: 'Fri 4 Dec 2026, 10:00 AM – 2:10 PM · Chair 3' },
    ]);
  });

  it('writes a new one-sitting booking as its status, stylist and "Sitting" line, without a sitting number', () => {
    expect(describeBookingChange(null, { status: 'held', stylist: 'Ana Moreno', sittings: [sitting1] }, words)).toEqual([
      { label: 'Status', before: null, after: 'Held' },
      { label: 'Stylist', before: null, after: 'Ana Moreno' },
      { label: 'Sitting', before: null, after: 'Tue 1 Dec 2026, 9:00 AM – 2:10 PM · Chair 1' },
    ]);
  });

  it('puts a deposit paid online in the salon’s currency (2500 cents = $25.00) and a cancellation’s outcome in words', () => {
    expect(describeBookingChange(null, { status: 'booked', deposit: 2500 }, words)).toEqual([
      { label: 'Status', before: null, after: 'Booked' },
      { label: 'Deposit paid', before: null, after: '$25.00' },
    ]);
    const before = { status: 'booked', sittings: [sitting1] };
    expect(describeBookingChange(before, { ...before, status: 'cancelled', deposit: 'refunded' }, words)).toEqual([
      { label: 'Status', before: 'Booked', after: 'Cancelled' },
      { label: 'Deposit', before: null, after: 'Refunded to the client' },
    ]);
  });

  it('names a stylist recorded by id, as older re-assign entries did', () => {
    const lines = describeBookingChange({ stylist: '6a87ef65-2e24-4309-ac67-413002e78490' }, { stylist: '00000000-0000-4000-8000-000000000009' }, words);
    expect(lines).toEqual([{ label: 'Stylist', before: 'Ana Moreno', after: 'a stylist no longer listed' }]);
  });
});

describe('entryTitle', () => {
  it('calls a time held while the client pays "Held online", also in entries that recorded it as booked', () => {
    expect(entryTitle('held online', { status: 'held' })).toBe('Held online');
    expect(entryTitle('booked', { status: 'held' })).toBe('Held online');
    expect(entryTitle('booked', { status: 'booked' })).toBe('Booked');
    expect(entryTitle('moved sitting 2', null)).toBe('Moved sitting 2');
  });

  it('numbers a moved sitting as the booking page does: "of 2", or not at all for one sitting', () => {
    const sitting = { chair: 'Chair 1', start: '2026-12-01T16:00:00.000Z', end: '2026-12-01T17:00:00.000Z' };
    expect(entryTitle('moved sitting 2', { sittings: [sitting, sitting] })).toBe('Moved sitting 2 of 2');
    expect(entryTitle('moved sitting 1', { sittings: [sitting] })).toBe('Moved');
  });
});
