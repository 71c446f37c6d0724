import { describe, expect, it } from 'vitest';
import { formatClock, formatDate, formatDateTime, formatDuration, formatRange, formatTime, formatZone } from './date-time';
import { formatFor } from './locale';

const newYork = formatFor('America/New_York');
const denver = formatFor('America/Denver');

describe('the date policy: weekday, day, month, year', () => {
  it('writes a calendar date the same in every zone', () => {
    // 3 December 2026 is a Thursday (Gregorian calendar).
    expect(formatDate('2026-12-03', denver)).toBe('Thursday 3 December 2026');
    expect(formatDate('2026-12-03', formatFor('Pacific/Kiritimati'), { width: 'short' })).toBe('Thu 3 Dec 2026');
    expect(formatDate('2026-12-03', denver, { year: false })).toBe('Thursday 3 December');
    expect(formatDate('2026-12-03', denver, { width: 'short', year: false })).toBe('Thu 3 Dec');
  });
  it('writes an instant on the salon’s calendar, not UTC’s', () => {
    // IANA tz database, America/Denver: MST (UTC−7) in December, so 05:00Z on the 3rd is 22:00 on the 2nd.
    expect(formatDate('2026-12-03T05:00:00Z', denver)).toBe('Wednesday 2 December 2026');
    expect(formatDate(new Date('2026-12-03T07:00:00Z'), denver)).toBe('Thursday 3 December 2026');
  });
  it('answers nothing for a date that is not one', () => {
    expect(formatDate('not a date', denver)).toBe('');
    expect(formatTime('not a time', denver)).toBe('');
  });
});

describe('times across the changes of clock (IANA tz database, America/New_York)', () => {
  it('springs forward on 2026-03-08 at 02:00 EST to 03:00 EDT (Rule US: Mar Sun>=8 2:00)', () => {
    expect(formatTime('2026-03-08T06:59:00Z', newYork, { zoneName: true })).toBe('1:59 AM EST');
    expect(formatTime('2026-03-08T07:00:00Z', newYork, { zoneName: true })).toBe('3:00 AM EDT');
  });
  it('falls back on 2026-11-01 at 02:00 EDT to 01:00 EST, so 1:30 AM happens twice (Rule US: Nov Sun>=1 2:00)', () => {
    expect(formatDateTime('2026-11-01T05:30:00Z', newYork, { zoneName: true })).toBe('Sunday 1 November 2026 at 1:30 AM EDT');
    expect(formatDateTime('2026-11-01T06:30:00Z', newYork, { zoneName: true })).toBe('Sunday 1 November 2026 at 1:30 AM EST');
  });
});

describe('joins', () => {
  it('says "at" in long dates and uses a comma in short ones', () => {
    // IANA tz database, America/Denver: MDT (UTC−6) in June, so 21:00Z is 3:00 PM.
    expect(formatDateTime('2027-06-08T21:00:00Z', denver)).toBe('Tuesday 8 June 2027 at 3:00 PM');
    expect(formatDateTime('2027-06-08T21:00:00Z', denver, { width: 'short' })).toBe('Tue 8 Jun 2027, 3:00 PM');
  });
  it('writes a range with a spaced en dash, with its date first when asked', () => {
    // America/Denver is UTC−7 in December (MST): 16:00Z is 9:00 AM, 21:10Z is 2:10 PM.
    expect(formatRange('2026-12-01T16:00:00Z', '2026-12-01T21:10:00Z', denver)).toBe('9:00 AM – 2:10 PM');
    expect(formatRange('2026-12-01T16:00:00Z', '2026-12-01T21:10:00Z', denver, { date: { width: 'short' } })).toBe('Tue 1 Dec 2026, 9:00 AM – 2:10 PM');
  });
  it('writes a wall-clock setting without a zone', () => {
    expect(formatClock('21:00', denver)).toBe('9:00 PM');
    expect(formatClock('08:30', denver)).toBe('8:30 AM');
    expect(formatClock('00:00', denver)).toBe('12:00 AM');
    expect(formatClock('21:00', denver, { hourOnly: true })).toBe('9 PM');
  });
  it('uses ordinary spaces only (SMS: GSM 03.38 has no no-break spaces)', () => {
    expect(formatDateTime('2027-06-08T21:00:00Z', denver, { zoneName: true })).not.toMatch(/[\u00a0\u2009\u202f]/);
  });
});

describe('lengths of time', () => {
  it('writes hours and minutes, leaving out what is zero', () => {
    expect(formatDuration(45)).toBe('45 min');
    expect(formatDuration(120)).toBe('2 h');
    expect(formatDuration(450)).toBe('7 h 30 min');
  });
});

describe('time zones in words', () => {
  it('names the zone as people say it on that date, with its city (IANA tz database, America/Denver: MST in winter, MDT in summer)', () => {
    expect(formatZone(denver, '2026-12-03')).toBe('Mountain Standard Time (Denver)');
    expect(formatZone(denver, '2027-06-08T15:00:00Z')).toBe('Mountain Daylight Time (Denver)');
    expect(formatZone(formatFor('America/New_York'), '2026-12-03')).toBe('Eastern Standard Time (New York)');
  });
  it('shows a name Intl does not know as it is stored', () => {
    expect(formatZone(formatFor('Not/AZone'), '2026-12-03')).toBe('Not/AZone');
  });
});
