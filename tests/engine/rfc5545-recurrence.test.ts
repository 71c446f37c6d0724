/**
 * Working-hour rules written as the recurrence examples of RFC 5545 §3.8.5.3 (B. Desruisseaux,
 * IETF, 2009; "All examples assume the Eastern United States time zone") expand to the dates the
 * RFC prints. Source of each expected list: the examples of RFC 5545 §3.8.5.3 (all in US Eastern time), each re-expanded with python-dateutil 2.9.0.
 */
import { describe, expect, it } from 'vitest';
import { parseScenario, planOptions } from '@shared/engine/engine';
import { parseLocalDate, zoneClock } from '@shared/engine/local-time';
import { ruleDays } from '@shared/engine/recurrence';

const NY = 'America/New_York';
const day = (date: string) => parseLocalDate(date)!;
const iso = (d: number) => new Date(d * 86_400_000).toISOString().slice(0, 10);

/** Dates of an RFC text rule between two local dates (from inclusive, to exclusive). */
function expand(dtstart: string, rrule: string, from: string, to: string): string[] {
  const text = `DTSTART;TZID=${NY}:${dtstart}\nRRULE:${rrule}`;
  return ruleDays(text, day(from), day(to), zoneClock(NY, day(from), day(to))).map(iso);
}

const dates = (year: number, month: number, days: number[]) => days.map((d) => `${year}-${String(month).padStart(2, '0')}-${String(d).padStart(2, '0')}`);

describe('RFC 5545 §3.8.5.3 recurrence examples', () => {
  it('"Daily for 10 occurrences": 1997 September 2-11 (RFC 5545 §3.8.5.3)', () => {
    expect(expand('19970902T090000', 'FREQ=DAILY;COUNT=10', '1997-09-01', '1997-12-31')).toEqual(dates(1997, 9, [2, 3, 4, 5, 6, 7, 8, 9, 10, 11]));
  });

  it('"Every 10 days, 5 occurrences": September 2,12,22; October 2,12 (RFC 5545 §3.8.5.3)', () => {
    expect(expand('19970902T090000', 'FREQ=DAILY;INTERVAL=10;COUNT=5', '1997-09-01', '1997-12-31')).toEqual([
      ...dates(1997, 9, [2, 12, 22]),
      ...dates(1997, 10, [2, 12]),
    ]);
  });

  it('"Weekly for 10 occurrences" crosses the end of daylight time (RFC 5545 §3.8.5.3)', () => {
    expect(expand('19970902T090000', 'FREQ=WEEKLY;COUNT=10', '1997-09-01', '1997-12-31')).toEqual([
      ...dates(1997, 9, [2, 9, 16, 23, 30]),
      ...dates(1997, 10, [7, 14, 21, 28]),
      ...dates(1997, 11, [4]),
    ]);
  });

  it('"Weekly on Tuesday and Thursday for five weeks", UNTIL form (RFC 5545 §3.8.5.3)', () => {
    const expected = [...dates(1997, 9, [2, 4, 9, 11, 16, 18, 23, 25, 30]), ...dates(1997, 10, [2])];
    expect(expand('19970902T090000', 'FREQ=WEEKLY;UNTIL=19971007T000000Z;WKST=SU;BYDAY=TU,TH', '1997-09-01', '1997-12-31')).toEqual(expected);
    expect(expand('19970902T090000', 'FREQ=WEEKLY;COUNT=10;WKST=SU;BYDAY=TU,TH', '1997-09-01', '1997-12-31')).toEqual(expected);
  });

  it('"Every other week on Tuesday and Thursday, for 8 occurrences" (RFC 5545 §3.8.5.3)', () => {
    expect(expand('19970902T090000', 'FREQ=WEEKLY;INTERVAL=2;COUNT=8;WKST=SU;BYDAY=TU,TH', '1997-09-01', '1997-12-31')).toEqual([
      ...dates(1997, 9, [2, 4, 16, 18, 30]),
      ...dates(1997, 10, [2, 14, 16]),
    ]);
  });

  it('"Monthly on the first Friday for 10 occurrences" (RFC 5545 §3.8.5.3)', () => {
    const got = [
      ...expand('19970905T090000', 'FREQ=MONTHLY;COUNT=10;BYDAY=1FR', '1997-09-01', '1997-12-31'),
      ...expand('19970905T090000', 'FREQ=MONTHLY;COUNT=10;BYDAY=1FR', '1997-12-31', '1998-07-01'),
    ];
    expect(got).toEqual([
      ...dates(1997, 9, [5]),
      ...dates(1997, 10, [3]),
      ...dates(1997, 11, [7]),
      ...dates(1997, 12, [5]),
      ...dates(1998, 1, [2]),
      ...dates(1998, 2, [6]),
      ...dates(1998, 3, [6]),
      ...dates(1998, 4, [3]),
      ...dates(1998, 5, [1]),
      ...dates(1998, 6, [5]),
    ]);
  });

  it('"Monthly on the second-to-last Monday of the month for 6 months" (RFC 5545 §3.8.5.3)', () => {
    const got = [
      ...expand('19970922T090000', 'FREQ=MONTHLY;COUNT=6;BYDAY=-2MO', '1997-09-01', '1997-12-31'),
      ...expand('19970922T090000', 'FREQ=MONTHLY;COUNT=6;BYDAY=-2MO', '1997-12-31', '1998-04-01'),
    ];
    expect(got).toEqual([
      ...dates(1997, 9, [22]),
      ...dates(1997, 10, [20]),
      ...dates(1997, 11, [17]),
      ...dates(1997, 12, [22]),
      ...dates(1998, 1, [19]),
      ...dates(1998, 2, [16]),
    ]);
  });

  it('"The third instance into the month of one of Tuesday, Wednesday, or Thursday" (RFC 5545 §3.8.5.3)', () => {
    expect(expand('19970904T090000', 'FREQ=MONTHLY;COUNT=3;BYDAY=TU,WE,TH;BYSETPOS=3', '1997-09-01', '1997-12-31')).toEqual([
      ...dates(1997, 9, [4]),
      ...dates(1997, 10, [7]),
      ...dates(1997, 11, [6]),
    ]);
  });

  it('"An example where an invalid date (i.e., February 30) is ignored" (RFC 5545 §3.8.5.3)', () => {
    expect(expand('20070115T090000', 'FREQ=MONTHLY;BYMONTHDAY=15,30;COUNT=5', '2007-01-01', '2007-04-30')).toEqual([
      ...dates(2007, 1, [15, 30]),
      ...dates(2007, 2, [15]),
      ...dates(2007, 3, [15, 30]),
    ]);
  });

  it('WKST makes a difference: WKST=MO gives Aug 5,10,19,24; WKST=SU gives Aug 5,17,19,31 (RFC 5545 §3.8.5.3)', () => {
    expect(expand('19970805T090000', 'FREQ=WEEKLY;INTERVAL=2;COUNT=4;BYDAY=TU,SU;WKST=MO', '1997-08-01', '1997-09-30')).toEqual(
      dates(1997, 8, [5, 10, 19, 24]),
    );
    expect(expand('19970805T090000', 'FREQ=WEEKLY;INTERVAL=2;COUNT=4;BYDAY=TU,SU;WKST=SU', '1997-08-01', '1997-09-30')).toEqual(
      dates(1997, 8, [5, 17, 19, 31]),
    );
  });

  it('a stylist whose hours follow the "Tuesday and Thursday for five weeks" rule is offered exactly those days', () => {
    // Same RFC 5545 §3.8.5.3 example, end to end through planOptions: one option per working day.
    const scenario = parseScenario({
      timeZone: NY,
      granularityMinutes: 15,
      horizon: { from: '1997-09-01', to: '1997-10-31' },
      salonHours: [{ rrule: 'FREQ=DAILY', start: '08:00', end: '20:00' }],
      stylists: [
        {
          id: 'ana',
          skills: ['colour'],
          hours: [{ rrule: `DTSTART;TZID=${NY}:19970902T090000\nRRULE:FREQ=WEEKLY;UNTIL=19971007T000000Z;WKST=SU;BYDAY=TU,TH`, start: '09:00', end: '17:00' }],
        },
      ],
      chairs: [{ id: 'c1' }],
      request: { skill: 'colour', earliest: '1997-09-01T00:00', sittings: [{ steps: [{ kind: 'hands_on', minutes: 60 }] }], limit: 50 },
    });
    const starts = planOptions(scenario).options.map((o) => o.sittings[0]!.steps[0]!.start);
    expect(starts).toEqual([...dates(1997, 9, [2, 4, 9, 11, 16, 18, 23, 25, 30]), ...dates(1997, 10, [2])].map((d) => `${d}T09:00-04:00`));
  });
});
