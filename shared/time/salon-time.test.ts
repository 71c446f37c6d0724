import { describe, expect, it } from 'vitest';
import { instantAt, instantIso, localClockOf, localDateOf, localDateTimeOf, localToInstant, minutesIntoDay, shiftLocalDate, todayIn } from './salon-time';

const NY = 'America/New_York';

describe('salon wall clock (IANA tz database, America/New_York)', () => {
  it('reads instants on the salon’s calendar and clock', () => {
    // EST is UTC−5 before 2026-03-08: 04:59Z is 23:59 on the day before.
    expect(localDateOf('2026-03-08T04:59:00Z', NY)).toBe('2026-03-07');
    expect(todayIn(NY, new Date('2026-03-08T05:00:00Z'))).toBe('2026-03-08');
    expect(localDateTimeOf(new Date('2026-03-08T07:00:00Z'), NY)).toBe('2026-03-08T03:00');
    expect(localClockOf('2026-03-08T06:59:00Z', NY)).toBe('01:59');
    expect(instantIso('2026-07-01T16:00:00Z', NY)).toBe('2026-07-01T12:00:00-04:00');
  });
  it('moves a wall time in the 2026-03-08 spring-forward gap (02:00–03:00) forward by the gap', () => {
    expect(instantAt('2026-03-08', NY, '02:30')?.toISOString()).toBe('2026-03-08T07:30:00.000Z');
    expect(localToInstant('2026-03-08', '10:00', NY)).toBe('2026-03-08T10:00:00-04:00');
  });
  it('reads the 1:30 AM that happens twice at the 2026-11-01 fall-back with the EST offset (the later one)', () => {
    expect(instantAt('2026-11-01', NY, '01:30')?.toISOString()).toBe('2026-11-01T06:30:00.000Z');
  });
  it('counts minutes into a day from its real midnight: the spring-forward day is 23 hours long', () => {
    expect(minutesIntoDay('2026-03-08T12:00:00-04:00', '2026-03-08', NY)).toBe(11 * 60);
    expect(minutesIntoDay('2026-11-01T12:00:00-05:00', '2026-11-01', NY)).toBe(13 * 60);
  });
  it('shifts calendar dates across month ends and answers null for dates that do not exist', () => {
    expect(shiftLocalDate('2026-02-27', 2)).toBe('2026-03-01');
    expect(shiftLocalDate('2026-03-01', -1)).toBe('2026-02-28');
    expect(instantAt('2027-02-31', NY)).toBeNull();
    expect(instantAt('2026-03-08', NY)?.toISOString()).toBe('2026-03-08T05:00:00.000Z');
  });
});
