import { describe, expect, it } from 'vitest';
import { actionLabel, describeChange, fieldLabel, valueText } from './history-change';

describe('describeChange', () => {
  it('lists only the values that changed, nested ones by path', () => {
    const before = { status: 'booked', sittings: [{ start: '2027-03-02T09:00:00-07:00', chair: 'A' }] };
    const after = { status: 'booked', sittings: [{ start: '2027-03-03T10:00:00-07:00', chair: 'A' }] };
    expect(describeChange(before, after)).toEqual([
      { field: 'sittings.1.start', before: '2027-03-02T09:00:00-07:00', after: '2027-03-03T10:00:00-07:00' },
    ]);
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
