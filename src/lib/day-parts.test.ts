import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import { dayPartOf, groupTimesByPart, spreadTimes } from './day-parts';
import type { FreeTime } from './free-times';

const zone = 'America/Denver';
const free = (date: string, hhmm: string): FreeTime => ({
  start: DateTime.fromISO(`${date}T${hhmm}`, { zone }).toISO()!,
  end: DateTime.fromISO(`${date}T${hhmm}`, { zone }).plus({ minutes: 30 }).toISO()!,
  stylistId: '00000000-0000-4000-8000-000000000001',
  stylistName: 'Ana Moreno',
});
/** Every 5 minutes from `from` to `to` (exclusive) on one day, as a salon with a 5-minute grid offers them. */
const everyFive = (date: string, from: string, to: string) => {
  const times: FreeTime[] = [];
  for (let t = DateTime.fromISO(`${date}T${from}`, { zone }); t < DateTime.fromISO(`${date}T${to}`, { zone }); t = t.plus({ minutes: 5 })) {
    times.push(free(date, t.toFormat('HH:mm')));
  }
  return times;
};
const clock = (times: FreeTime[]) => times.map((t) => DateTime.fromISO(t.start, { zone }).toFormat('HH:mm'));

describe('dayPartOf', () => {
  // Common practice for the parts of a salon day: morning until noon, afternoon until 17:00, evening after.
  it('reads the salon clock: 11:55 is morning, 12:00 afternoon, 16:55 afternoon, 17:00 evening', () => {
    expect(['11:55', '12:00', '16:55', '17:00'].map((t) => dayPartOf(free('2027-07-13', t).start, zone))).toEqual([
      'morning',
      'afternoon',
      'afternoon',
      'evening',
    ]);
  });

  it('uses the salon zone, not UTC: 10:00 in Denver in July is 16:00 UTC and still morning', () => {
    expect(dayPartOf('2027-07-13T16:00:00Z', zone)).toBe('morning');
  });
});

describe('groupTimesByPart', () => {
  it('keeps only the parts that have times, in the order of the day', () => {
    const parts = groupTimesByPart([free('2027-07-13', '09:00'), free('2027-07-13', '09:05'), free('2027-07-13', '18:00')], zone);
    expect(parts.map((p) => [p.part, p.times.length])).toEqual([
      ['morning', 2],
      ['evening', 1],
    ]);
  });
});

describe('spreadTimes', () => {
  it('leaves a short list as it is', () => {
    const times = everyFive('2027-07-13', '09:00', '09:30');
    expect(spreadTimes(times, zone, 8)).toEqual(times);
  });

  it('spreads a morning of 5-minute starts (09:00–11:55, 36 of them) over the half hours: 6 starts', () => {
    // By hand: quarter hours 09:00, 09:15 … 11:45 are 12 (more than 8); half hours 09:00 … 11:30 are 6.
    expect(clock(spreadTimes(everyFive('2027-07-13', '09:00', '12:00'), zone, 8))).toEqual(['09:00', '09:30', '10:00', '10:30', '11:00', '11:30']);
  });

  it('takes the first free start in each step when the round one is taken, and coarser steps for a long afternoon', () => {
    // 12:00–16:55 less 12:00–12:25: half hours 12:30 … 16:30 are 9 (more than 8), so hours: 12:30 (the first in 12:00–13:00), 13:00, 14:00, 15:00, 16:00.
    const afternoon = everyFive('2027-07-13', '12:30', '17:00');
    expect(clock(spreadTimes(afternoon, zone, 8))).toEqual(['12:30', '13:00', '14:00', '15:00', '16:00']);
  });
});
