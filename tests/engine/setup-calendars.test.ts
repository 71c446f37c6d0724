/**
 * The set-up screens' weekday rules and out-of-service periods. Expected dates come from
 * RFC 5545 §3.8.5.3 ("Every other week on Tuesday and Thursday, for 8 occurrences", DTSTART
 * 1997-09-02 in America/New_York) and from the EXDATE property of RFC 5545 §3.8.5.1.
 */
import { describe, expect, it } from 'vitest';
import { findFreeStylists, parseScenario, planOptions, type ScenarioInput } from '@shared/engine/engine';
import { composeWeeklyRule, nextDates, readWeeklyRule, ruleProblem } from '@shared/engine/weekly-rule';

describe('weekday rules written by the hours editor', () => {
  const everyOther = composeWeeklyRule({ weekdays: ['TH', 'TU'], everyOtherWeek: true, startsOn: '1997-09-02', closedDates: [] });

  it('every other week on Tuesday and Thursday gives the RFC 5545 §3.8.5.3 dates', () => {
    expect(everyOther).toBe('DTSTART;VALUE=DATE:19970902\nRRULE:FREQ=WEEKLY;INTERVAL=2;BYDAY=TU,TH');
    // RFC 5545 §3.8.5.3: Sep 2,4,16,18,30; Oct 2,14,16 (1997).
    expect(nextDates(everyOther, 'America/New_York', '1997-09-01', 8)).toEqual([
      '1997-09-02',
      '1997-09-04',
      '1997-09-16',
      '1997-09-18',
      '1997-09-30',
      '1997-10-02',
      '1997-10-14',
      '1997-10-16',
    ]);
  });

  it('closed dates are left out (EXDATE, RFC 5545 §3.8.5.1), and the text reads back into the editor', () => {
    const rule = { weekdays: ['MO', 'FR'] as const, everyOtherWeek: false, startsOn: null, closedDates: ['2027-12-24', '2027-12-27'] };
    const text = composeWeeklyRule({ ...rule, weekdays: [...rule.weekdays] });
    expect(text).toBe('RRULE:FREQ=WEEKLY;BYDAY=MO,FR\nEXDATE;VALUE=DATE:20271224,20271227');
    expect(nextDates(text, 'Europe/Berlin', '2027-12-20', 4)).toEqual(['2027-12-20', '2027-12-31', '2028-01-03', '2028-01-07']);
    expect(readWeeklyRule(text)).toEqual({ ...rule, weekdays: ['MO', 'FR'] });
    expect(readWeeklyRule(everyOther)).toEqual({ weekdays: ['TU', 'TH'], everyOtherWeek: true, startsOn: '1997-09-02', closedDates: [] });
    expect(readWeeklyRule('FREQ=WEEKLY;BYDAY=SA')).toEqual({ weekdays: ['SA'], everyOtherWeek: false, startsOn: null, closedDates: [] });
  });

  it('rules the editor cannot show stay as text; rules that do not parse name the problem', () => {
    expect(readWeeklyRule('FREQ=MONTHLY;BYDAY=1SA')).toBeNull();
    expect(readWeeklyRule('FREQ=WEEKLY;BYDAY=MO;COUNT=3')).toBeNull();
    expect(ruleProblem('FREQ=MONTHLY;BYDAY=1SA')).toBeNull();
    expect(ruleProblem('BYDAY=MO')).toMatch(/no FREQ/);
    expect(ruleProblem('FREQ=WEEKLY;BYDAY=XX')).not.toBeNull();
    expect(ruleProblem('RRULE:FREQ=WEEKLY\nCOLOR:red')).toMatch(/unsupported line/);
  });
});

function scenario(): ScenarioInput {
  return {
    timeZone: 'America/Denver',
    granularityMinutes: 5,
    horizon: { from: '2027-03-02', to: '2027-03-04' },
    salonHours: [{ rrule: 'FREQ=DAILY', start: '09:00', end: '18:00' }],
    stylists: [
      { id: 'ana', skills: ['colour'], hours: [{ rrule: 'FREQ=DAILY', start: '09:00', end: '18:00' }] },
      { id: 'bo', skills: ['colour'], hours: [{ rrule: 'FREQ=DAILY', start: '12:00', end: '18:00' }] },
      { id: 'cy', skills: ['cut'], hours: [{ rrule: 'FREQ=DAILY', start: '09:00', end: '18:00' }] },
    ],
    chairs: [{ id: 'c1', outOfService: [{ start: '2027-03-02T00:00', end: '2027-03-03T00:00' }] }, { id: 'c2' }],
    basins: [{ id: 'b1' }],
    request: {
      skill: 'colour',
      stylist: 'ana',
      earliest: '2027-03-02T09:00',
      limit: 1,
      spread: 'none',
      sittings: [{ steps: [{ kind: 'hands_on', minutes: 60 }] }],
    },
  };
}

describe('out-of-service chairs and free stylists', () => {
  it('a chair out of service is not offered during its period, and is again after it', () => {
    const first = planOptions(parseScenario(scenario())).options[0]!;
    expect(first.sittings[0]).toMatchObject({ chair: 'c2', steps: [{ start: '2027-03-02T09:00-07:00' }] });
    const both = scenario();
    both.chairs[1]!.outOfService = [{ start: '2027-03-02T00:00', end: '2027-03-03T00:00' }];
    const next = planOptions(parseScenario({ ...both, horizon: { from: '2027-03-02', to: '2027-03-05' } })).options[0]!;
    expect(next.sittings[0]!.steps[0]!.start).toBe('2027-03-03T09:00-07:00');
  });

  it('free stylists have the skill, the hours and free hands for every step', () => {
    const s = parseScenario(scenario());
    const sitting = { id: 'k', stylist: 'ana', chair: 'c2', steps: [{ kind: 'hands_on' as const, start: '2027-03-02T13:00', end: '2027-03-02T14:00' }] };
    expect(findFreeStylists(s, 'colour', [sitting])).toEqual(['ana', 'bo']);
    expect(findFreeStylists(s, 'colour', [{ ...sitting, steps: [{ kind: 'hands_on', start: '2027-03-02T10:00', end: '2027-03-02T11:00' }] }])).toEqual(['ana']);
    const busy = parseScenario({
      ...scenario(),
      bookings: [{ id: 'x', stylist: 'bo', chair: 'c2', steps: [{ kind: 'hands_on', start: '2027-03-02T13:30', end: '2027-03-02T14:30' }] }],
    });
    expect(findFreeStylists(busy, 'colour', [{ ...sitting, chair: 'c1' }])).toEqual(['ana']);
  });
});
