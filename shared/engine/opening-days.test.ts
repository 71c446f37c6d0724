import { describe, expect, it } from 'vitest';
import { openingDays } from './opening-days';

// Weekdays read from a printed calendar: 30 November 2026 is a Monday, 6 December 2026 a Sunday.
describe('openingDays', () => {
  const weekly = { rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '21:00' };

  it('opens Tuesday to Saturday and leaves Monday and Sunday closed', () => {
    const week = openingDays([weekly], 'America/Denver', '2026-11-30', 7);
    expect(week.map((d) => d.date)).toEqual(['2026-11-30', '2026-12-01', '2026-12-02', '2026-12-03', '2026-12-04', '2026-12-05', '2026-12-06']);
    expect(week.map((d) => d.hours.length)).toEqual([0, 1, 1, 1, 1, 1, 0]);
    expect(week[1]?.hours).toEqual([{ start: '09:00', end: '21:00' }]);
  });

  it('closes on an EXDATE closed date (RFC 5545 §3.8.5.1), by local date', () => {
    const rule = { ...weekly, rrule: 'RRULE:FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA\nEXDATE;VALUE=DATE:20261203' };
    const week = openingDays([rule], 'America/Denver', '2026-11-30', 7);
    expect(week.find((d) => d.date === '2026-12-03')?.hours).toEqual([]);
    expect(week.find((d) => d.date === '2026-12-04')?.hours).toEqual([{ start: '09:00', end: '21:00' }]);
  });

  it('gives each date its own line of hours and joins lines that overlap', () => {
    const saturday = { rrule: 'FREQ=WEEKLY;BYDAY=SA', start: '08:00', end: '17:00' };
    const lateThursday = { rrule: 'FREQ=WEEKLY;BYDAY=TH', start: '17:00', end: '22:00' };
    const week = openingDays([{ ...weekly, rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR' }, saturday, lateThursday], 'America/Denver', '2026-11-30', 7);
    expect(week.find((d) => d.date === '2026-12-05')?.hours).toEqual([{ start: '08:00', end: '17:00' }]);
    expect(week.find((d) => d.date === '2026-12-03')?.hours).toEqual([{ start: '09:00', end: '22:00' }]);
  });

  it('counts every other week from its DTSTART (INTERVAL=2)', () => {
    const rule = { rrule: 'DTSTART;VALUE=DATE:20261201\nRRULE:FREQ=WEEKLY;INTERVAL=2;BYDAY=TU', start: '10:00', end: '16:00' };
    const days = openingDays([rule], 'America/Denver', '2026-11-30', 21)
      .filter((d) => d.hours.length)
      .map((d) => d.date);
    expect(days).toEqual(['2026-12-01', '2026-12-15']);
  });
});
