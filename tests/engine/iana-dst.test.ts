/**
 * Daylight-saving checks against the IANA tz database (read through luxon/Intl).
 * Expected instants follow the rules in the IANA tz database source files (tzdata 2025b): `northamerica`
 * "Rule US 2007 max Mar Sun>=8 2:00 / Nov Sun>=1 2:00" and `europe` "Rule EU lastSun 1:00u".
 * The 2027 dates (Denver 2027-03-14 and 2027-11-07, London 2027-03-28 and 2027-10-31) are worked
 * out by hand from those rules (not copied from a published table).
 */
import { describe, expect, it } from 'vitest';
import { measureOccupancy, parseScenario, planOptions } from '@shared/engine/engine';

function scenario(zone: string, date: string, extra: Record<string, unknown> = {}) {
  const next = new Date(Date.parse(`${date}T00:00:00Z`) + 86_400_000).toISOString().slice(0, 10);
  return parseScenario({
    timeZone: zone,
    granularityMinutes: 15,
    horizon: { from: date, to: next },
    salonHours: [{ rrule: 'FREQ=DAILY', start: '00:00', end: '24:00' }],
    stylists: [{ id: 'ana', skills: ['colour'], hours: [{ rrule: 'FREQ=DAILY', start: '00:00', end: '24:00' }] }],
    chairs: [{ id: 'c1' }],
    ...extra,
  });
}

// A 4-hour sitting (real minutes) from local midnight: 30 hands_on, 180 developing, 30 hands_on.
const longSitting = (date: string) => ({
  skill: 'colour',
  earliest: `${date}T00:00`,
  limit: 1,
  sittings: [
    {
      steps: [
        { kind: 'hands_on', minutes: 30 },
        { kind: 'developing', minMinutes: 180, maxMinutes: 180 },
        { kind: 'hands_on', minutes: 30 },
      ],
    },
  ],
});

const cases: Array<[zone: string, date: string, dayHours: number, start: string, end: string]> = [
  // Spring forward at 02:00 MST = 09:00Z: 00:00-07:00 + 4 h = 05:00-06:00 (tz Rule US, Mar Sun>=8).
  ['America/Denver', '2027-03-14', 23, '2027-03-14T00:00-07:00', '2027-03-14T05:00-06:00'],
  // Fall back at 02:00 MDT = 08:00Z: 00:00-06:00 + 4 h = 03:00-07:00 (tz Rule US, Nov Sun>=1).
  ['America/Denver', '2027-11-07', 25, '2027-11-07T00:00-06:00', '2027-11-07T03:00-07:00'],
  // BST starts 01:00Z: 00:00+00:00 + 4 h = 05:00+01:00 (tz Rule EU, Mar lastSun 1:00u).
  ['Europe/London', '2027-03-28', 23, '2027-03-28T00:00+00:00', '2027-03-28T05:00+01:00'],
  // BST ends 01:00Z: 00:00+01:00 + 4 h = 03:00+00:00 (tz Rule EU, Oct lastSun 1:00u).
  ['Europe/London', '2027-10-31', 25, '2027-10-31T00:00+01:00', '2027-10-31T03:00+00:00'],
];

describe('daylight-saving days (IANA tz database)', () => {
  it.each(cases)('%s %s: a sitting across the change keeps its real length and local end', (zone, date, _h, start, end) => {
    const option = planOptions(scenario(zone, date, { request: longSitting(date) })).options[0]!;
    const steps = option.sittings[0]!.steps;
    expect(steps[0]!.start).toBe(start);
    expect(steps[2]!.end).toBe(end);
    expect((Date.parse(steps[2]!.end) - Date.parse(steps[0]!.start)) / 60_000).toBe(240);
  });

  it.each(cases)('%s %s: a 00:00-24:00 working day has %i real hours', (zone, date, dayHours) => {
    // One 60-minute booking in one chair: occupancy = 60 / real minutes the salon is open.
    const at = (hhmm: string) => `${date}T${hhmm}`;
    const s = scenario(zone, date, {
      bookings: [{ id: 'b', stylist: 'ana', chair: 'c1', steps: [{ kind: 'hands_on', start: at('12:00'), end: at('13:00') }] }],
    });
    const answer = measureOccupancy(s);
    expect(answer.chairOccupancy).toBe(60 / (dayHours * 60));
    expect(answer.handsOnShare.ana).toBe(60 / (dayHours * 60));
  });

  it('working hours 01:00-05:00 on the Denver spring-forward day are 3 real hours', () => {
    const s = scenario('America/Denver', '2027-03-14', {
      stylists: [{ id: 'ana', skills: ['colour'], hours: [{ rrule: 'FREQ=DAILY', start: '01:00', end: '05:00' }] }],
      bookings: [{ id: 'b', stylist: 'ana', chair: 'c1', steps: [{ kind: 'hands_on', start: '2027-03-14T01:00', end: '2027-03-14T04:00' }] }],
    });
    // The booking 01:00-04:00 local is 2 real hours (02:00 MST -> 03:00 MDT); the day is 3.
    expect(measureOccupancy(s).handsOnShare.ana).toBe(2 / 3);
  });
});

describe('local times that are not one instant (RFC 5545 §3.3.5)', () => {
  it('an ambiguous fall-back time means its first occurrence (01:30 MDT, not MST)', () => {
    const request = { ...longSitting('2027-11-07'), earliest: '2027-11-07T01:30' };
    const option = planOptions(scenario('America/Denver', '2027-11-07', { request })).options[0]!;
    expect(option.sittings[0]!.steps[0]!.start).toBe('2027-11-07T01:30-06:00');
  });

  it('hours starting inside the spring-forward gap begin at the same distance after it (02:30 -> 03:30 MDT)', () => {
    const request = { ...longSitting('2027-03-14'), sittings: [{ steps: [{ kind: 'hands_on', minutes: 30 }] }] };
    const s = scenario('America/Denver', '2027-03-14', {
      salonHours: [{ rrule: 'FREQ=DAILY', start: '02:30', end: '06:00' }],
      request,
    });
    expect(planOptions(s).options[0]!.sittings[0]!.steps[0]!.start).toBe('2027-03-14T03:30-06:00');
  });

  it('an explicit date-time inside the gap is rejected, naming the field', () => {
    expect(() => scenario('America/Denver', '2027-03-14', { request: { ...longSitting('2027-03-14'), earliest: '2027-03-14T02:30' } })).toThrow(
      /request\.earliest: .*does not exist/,
    );
  });
});
