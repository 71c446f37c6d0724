import { describe, expect, it } from 'vitest';
import { fromCalendarTime, toCalendarTime } from './calendar-time';

const zone = 'America/Denver';

describe('toCalendarTime', () => {
  it('writes the salon wall clock as UTC, in winter and in summer', () => {
    expect(toCalendarTime('2027-01-12T16:30:00Z', zone)).toBe('2027-01-12T09:30:00Z');
    expect(toCalendarTime('2027-07-12T15:30:00Z', zone)).toBe('2027-07-12T09:30:00Z');
  });

  it('keeps the wall clock on the day the clocks go forward', () => {
    // 14 March 2027, 03:00 MDT = 09:00 UTC.
    expect(toCalendarTime('2027-03-14T09:00:00Z', zone)).toBe('2027-03-14T03:00:00Z');
  });
});

describe('fromCalendarTime', () => {
  it('turns a dropped calendar time back into the real instant with the salon offset', () => {
    expect(fromCalendarTime(new Date('2027-01-12T09:30:00Z'), zone)).toBe('2027-01-12T09:30:00-07:00');
    expect(fromCalendarTime(new Date('2027-07-12T09:30:00Z'), zone)).toBe('2027-07-12T09:30:00-06:00');
  });

  it('is the inverse of toCalendarTime across the change to summer time', () => {
    for (const iso of ['2027-03-13T16:00:00Z', '2027-03-14T16:00:00Z', '2027-11-07T17:00:00Z']) {
      const back = fromCalendarTime(new Date(toCalendarTime(iso, zone)), zone);
      expect(new Date(back).toISOString()).toBe(new Date(iso).toISOString());
    }
  });

  it('moves a time that does not exist in the salon (02:30 on spring-forward day) to a real one', () => {
    const result = fromCalendarTime(new Date('2027-03-14T02:30:00Z'), zone);
    expect(result).toBe('2027-03-14T03:30:00-06:00');
  });
});
