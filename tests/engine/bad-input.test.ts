/** Bad input is rejected with a ScenarioError naming the field, never with a partial answer. */
import { describe, expect, it } from 'vitest';
import { parseScenario, planOptions, ScenarioError, type ScenarioInput } from '@shared/engine/engine';

function base(): ScenarioInput {
  return {
    timeZone: 'America/Denver',
    granularityMinutes: 5,
    horizon: { from: '2027-03-01', to: '2027-03-20' },
    salonHours: [{ rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start: '09:00', end: '21:00' }],
    stylists: [{ id: 'ana', skills: ['colour'], hours: [{ rrule: 'FREQ=WEEKLY;BYDAY=TU,WE', start: '10:00', end: '19:00' }], timeOff: [] }],
    chairs: [{ id: 'c1' }],
    basins: [{ id: 'b1' }],
    bookings: [
      {
        id: 'k1',
        stylist: 'ana',
        chair: 'c1',
        steps: [
          { kind: 'hands_on', start: '2027-03-02T10:00', end: '2027-03-02T10:30' },
          { kind: 'basin', start: '2027-03-02T10:30', end: '2027-03-02T10:45', basin: 'b1' },
        ],
      },
    ],
    request: {
      skill: 'colour',
      stylist: null,
      earliest: '2027-03-02T00:00',
      limit: 3,
      sittings: [
        {
          steps: [
            { kind: 'hands_on', minutes: 30 },
            { kind: 'developing', minMinutes: 20, maxMinutes: 40 },
          ],
        },
        { daysAfterPrevious: { min: 1, max: 7 }, steps: [{ kind: 'hands_on', minutes: 60 }] },
      ],
    },
  };
}

type Edit = (s: any) => void; // eslint-disable-line @typescript-eslint/no-explicit-any -- edits break the plan's shape on purpose

const cases: Array<[problem: string, edit: Edit, field: string]> = [
  [
    'unknown time zone',
    (s) => {
      s.timeZone = 'Mars/Olympus_Mons';
    },
    'timeZone',
  ],
  [
    'granularity not a divisor of 60',
    (s) => {
      s.granularityMinutes = 7;
    },
    'granularityMinutes',
  ],
  [
    'horizon over 120 days',
    (s) => {
      s.horizon.to = '2027-07-01';
    },
    'horizon',
  ],
  [
    'horizon.to not after from',
    (s) => {
      s.horizon.to = '2027-03-01';
    },
    'horizon.to',
  ],
  [
    'not a calendar date',
    (s) => {
      s.horizon.from = '2027-02-30';
    },
    'horizon.from',
  ],
  [
    'nonexistent booking time (spring-forward gap)',
    (s) => {
      s.horizon.to = '2027-03-30';
      s.bookings[0].steps[0].start = '2027-03-14T02:30';
      s.bookings[0].steps[0].end = '2027-03-14T02:45';
      s.bookings[0].steps[1].start = '2027-03-14T03:00';
      s.bookings[0].steps[1].end = '2027-03-14T03:15';
    },
    'bookings[0].steps[0].start',
  ],
  [
    'nonexistent time off',
    (s) => {
      s.stylists[0].timeOff = [{ start: '2027-03-14T02:10', end: '2027-03-15T00:00' }];
    },
    'stylists[0].timeOff[0].start',
  ],
  [
    'nonexistent earliest',
    (s) => {
      s.request.earliest = '2027-03-14T02:00';
    },
    'request.earliest',
  ],
  [
    'developing min > max',
    (s) => {
      s.request.sittings[0].steps[1].minMinutes = 50;
    },
    'request.sittings[0].steps[1].minMinutes',
  ],
  [
    'daysAfterPrevious min > max',
    (s) => {
      s.request.sittings[1].daysAfterPrevious.min = 9;
    },
    'request.sittings[1].daysAfterPrevious.min',
  ],
  [
    'daysAfterPrevious.min below 1',
    (s) => {
      s.request.sittings[1].daysAfterPrevious.min = 0;
    },
    'request.sittings[1].daysAfterPrevious.min',
  ],
  [
    'later sitting without daysAfterPrevious',
    (s) => {
      delete s.request.sittings[1].daysAfterPrevious;
    },
    'request.sittings[1].daysAfterPrevious',
  ],
  [
    'duration off the grid',
    (s) => {
      s.request.sittings[0].steps[0].minutes = 32;
    },
    'request.sittings[0].steps[0].minutes',
  ],
  [
    'developing max off the grid',
    (s) => {
      s.request.sittings[0].steps[1].maxMinutes = 41;
    },
    'request.sittings[0].steps[1].maxMinutes',
  ],
  [
    'booking start off the grid',
    (s) => {
      s.bookings[0].steps[0].start = '2027-03-02T10:03';
    },
    'bookings[0].steps[0].start',
  ],
  [
    'hours start off the grid',
    (s) => {
      s.stylists[0].hours[0].start = '10:07';
    },
    'stylists[0].hours[0].start',
  ],
  [
    'hours end before start',
    (s) => {
      s.salonHours[0].end = '08:00';
    },
    'salonHours[0].end',
  ],
  [
    'unknown request step kind',
    (s) => {
      s.request.sittings[0].steps[0].kind = 'drying';
    },
    'request.sittings[0].steps[0].kind',
  ],
  [
    'unknown booked step kind',
    (s) => {
      s.bookings[0].steps[0].kind = 'drying';
    },
    'bookings[0].steps[0].kind',
  ],
  [
    'unknown request.stylist',
    (s) => {
      s.request.stylist = 'zoe';
    },
    'request.stylist',
  ],
  [
    'unknown booking stylist',
    (s) => {
      s.bookings[0].stylist = 'zoe';
    },
    'bookings[0].stylist',
  ],
  [
    'unknown booking chair',
    (s) => {
      s.bookings[0].chair = 'c9';
    },
    'bookings[0].chair',
  ],
  [
    'unknown basin',
    (s) => {
      s.bookings[0].steps[1].basin = 'b9';
    },
    'bookings[0].steps[1].basin',
  ],
  [
    'RRULE that does not parse',
    (s) => {
      s.stylists[0].hours[0].rrule = 'FREQ=WEEKLY;BYDAY=XX';
    },
    'stylists[0].hours[0].rrule',
  ],
  [
    'RRULE without FREQ',
    (s) => {
      s.salonHours[0].rrule = 'BYDAY=TU';
    },
    'salonHours[0].rrule',
  ],
  [
    'booked steps out of order',
    (s) => {
      s.bookings[0].steps[1].start = '2027-03-02T10:20';
    },
    'bookings[0].steps[1].start',
  ],
  [
    'duplicate stylist id',
    (s) => {
      s.stylists.push({ ...s.stylists[0] });
    },
    'stylists[1].id',
  ],
  [
    'missing field',
    (s) => {
      delete s.chairs;
    },
    'chairs',
  ],
  [
    'unknown field',
    (s) => {
      s.request.colour = 'blue';
    },
    'request',
  ],
];

describe('parseScenario rejects bad input, naming the field', () => {
  it('accepts the unedited scenario', () => {
    expect(planOptions(parseScenario(base())).options.length).toBe(3);
  });

  it.each(cases)('%s -> %s', (_problem, edit, field) => {
    const s = base();
    edit(s);
    let caught: unknown = null;
    try {
      parseScenario(s);
    } catch (e) {
      caught = e;
    }
    expect(caught).toBeInstanceOf(ScenarioError);
    expect((caught as ScenarioError).field).toBe(field);
    expect((caught as ScenarioError).message.startsWith(`${field}: `)).toBe(true);
  });

  it('text that is not JSON', () => {
    expect(() => parseScenario('{ "timeZone": ')).toThrow(ScenarioError);
  });

  it('the query functions reject a bad scenario built in code, with no partial answer', () => {
    const s = parseScenario(base());
    expect(() => planOptions({ ...s, timeZone: 'Nowhere/Else' })).toThrow(/timeZone/);
    expect(() => planOptions({ ...s, request: undefined })).toThrow(/request/);
  });
});
