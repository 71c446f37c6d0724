import { describe, expect, it } from 'vitest';
import { formatMinutes, localToInstant } from './time';

describe('localToInstant', () => {
  it('reads a date and time in the salon zone, with the offset of that day', () => {
    expect(localToInstant('2027-07-12', '10:15', 'America/Denver')).toBe('2027-07-12T10:15:00-06:00');
    expect(localToInstant('2027-01-12', '10:15', 'America/Denver')).toBe('2027-01-12T10:15:00-07:00');
  });
  it('answers null for a date that does not exist', () => {
    expect(localToInstant('2027-02-31', '10:15', 'America/Denver')).toBeNull();
  });
});

describe('formatMinutes', () => {
  it('writes hours and minutes', () => {
    expect(formatMinutes(45)).toBe('45 min');
    expect(formatMinutes(120)).toBe('2 h');
    expect(formatMinutes(450)).toBe('7 h 30 min');
  });
});
