import { Settings } from 'luxon';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dayAfterLast, dayLabel, freeTimeLabel, groupTimesByDay, oneTimePerStart, type FreeTime } from './free-times';

const zone = 'America/Denver';
const free = (start: string, stylistName = 'Ana Moreno'): FreeTime => ({
  start,
  end: start,
  stylistId: stylistName === 'Ana Moreno' ? '00000000-0000-4000-8000-000000000001' : '00000000-0000-4000-8000-000000000002',
  stylistName,
});

beforeAll(() => {
  Settings.defaultLocale = 'en-US';
});
afterAll(() => {
  Settings.defaultLocale = '';
});

describe('groupTimesByDay', () => {
  it('groups by the salon-local day, not the UTC day (a 23:30 start stays on its evening)', () => {
    const days = groupTimesByDay([free('2027-07-13T05:30:00Z'), free('2027-07-12T16:00:00Z')], zone);
    expect(days.map((d) => d.date)).toEqual(['2027-07-12']);
    expect(days[0]!.times.map((t) => t.start)).toEqual(['2027-07-12T16:00:00Z', '2027-07-13T05:30:00Z']);
  });

  it('keeps the spring-forward day whole: times on both sides of the skipped hour share one day', () => {
    const days = groupTimesByDay([free('2027-03-14T03:00:00-06:00'), free('2027-03-14T01:30:00-07:00'), free('2027-03-15T09:00:00-06:00')], zone);
    expect(days.map((d) => [d.date, d.times.length])).toEqual([
      ['2027-03-14', 2],
      ['2027-03-15', 1],
    ]);
    expect(days[0]!.times[0]!.start).toBe('2027-03-14T01:30:00-07:00');
  });

  it('orders the repeated hour of the fall-back day by instant, on one day', () => {
    const days = groupTimesByDay([free('2027-11-07T01:30:00-07:00'), free('2027-11-07T01:30:00-06:00')], zone);
    expect(days).toHaveLength(1);
    expect(days[0]!.times.map((t) => t.start)).toEqual(['2027-11-07T01:30:00-06:00', '2027-11-07T01:30:00-07:00']);
  });

  it('lists the same start with two stylists by stylist name', () => {
    const days = groupTimesByDay([free('2027-07-12T16:00:00Z', 'Bo Lind'), free('2027-07-12T16:00:00Z')], zone);
    expect(days[0]!.times.map((t) => t.stylistName)).toEqual(['Ana Moreno', 'Bo Lind']);
  });

  it('answers no days for no times', () => {
    expect(groupTimesByDay([], zone)).toEqual([]);
  });
});

describe('freeTimeLabel', () => {
  it('names the salon-local day, the time and the stylist', () => {
    expect(dayLabel('2026-12-08')).toBe('Tuesday 8 December');
    expect(freeTimeLabel(free('2026-12-08T17:00:00Z'), zone)).toBe('Tuesday 8 December, 10:00 AM with Ana Moreno');
  });
});

describe('dayAfterLast', () => {
  it('is the salon-local day after the last time (not the UTC one)', () => {
    expect(dayAfterLast([free('2027-07-12T16:00:00Z'), free('2027-07-13T05:30:00Z')], zone)).toBe('2027-07-13');
    expect(dayAfterLast([], zone)).toBeUndefined();
  });
});

describe('oneTimePerStart', () => {
  it('keeps one choice per start (the stylist first by name), earliest first', () => {
    const times = oneTimePerStart([free('2027-07-12T17:00:00Z'), free('2027-07-12T16:00:00Z', 'Bo Lind'), free('2027-07-12T16:00:00Z')]);
    expect(times.map((t) => [t.start, t.stylistName])).toEqual([
      ['2027-07-12T16:00:00Z', 'Ana Moreno'],
      ['2027-07-12T17:00:00Z', 'Ana Moreno'],
    ]);
  });

  it('treats one instant written with two offsets as one start', () => {
    expect(oneTimePerStart([free('2027-07-12T16:00:00Z'), free('2027-07-12T10:00:00-06:00', 'Bo Lind')])).toHaveLength(1);
  });
});
