/**
 * Allowed starts: a limit on where each sitting may start, searched within (the K earliest pairs are the K earliest
 * that respect it), and the request steps' own ids and labels returned on the planned steps.
 */
import { describe, expect, it } from 'vitest';
import { parseScenario, planOptions, ScenarioError, type ScenarioInput } from '@shared/engine/engine';

// A week in Denver; one stylist and one chair, open 09:00–17:00 every day.
const week = { from: '2027-06-01', to: '2027-06-08' };
const daily = [{ rrule: 'FREQ=DAILY', start: '09:00', end: '17:00' }];
const steps = [
  { kind: 'hands_on', minutes: 30 },
  { kind: 'developing', minMinutes: 15, maxMinutes: 30 },
  { kind: 'basin', minutes: 15 },
] as const;

type Sitting = NonNullable<ScenarioInput['request']>['sittings'][number];

function scenario(sittings: Sitting[], extra: Partial<NonNullable<ScenarioInput['request']>> = {}): ScenarioInput {
  return {
    timeZone: 'America/Denver',
    granularityMinutes: 15,
    horizon: week,
    salonHours: daily,
    stylists: [{ id: 'ana', skills: ['colour'], hours: daily }],
    chairs: [{ id: 'c1' }],
    basins: [{ id: 'b1' }],
    request: { skill: 'colour', earliest: '2027-06-01T09:00', sittings, limit: 3, spread: 'day', ...extra },
  };
}

const starts = (s: ScenarioInput) => planOptions(parseScenario(s)).options.map((o) => o.sittings.map((x) => x.steps[0]!.start.slice(0, 16)));

describe('allowed starts', () => {
  it('gives the K earliest pairs inside the stretches, searching on past the days before them', () => {
    // Days 1–4 are outside: without the limit the first three options would be June 1–3.
    const s = scenario([{ steps: [...steps], allowedStarts: [{ from: '2027-06-05T00:00', to: '2027-06-30T00:00' }] }]);
    expect(starts(s)).toEqual([['2027-06-05T09:00'], ['2027-06-06T09:00'], ['2027-06-07T09:00']]);
  });

  it('counts both ends and rounds the stretch inward onto the grid', () => {
    // 10:05 rounds up to 10:15 (15-minute grid); 10:44 rounds down to 10:30.
    const s = scenario([{ steps: [...steps], allowedStarts: [{ from: '2027-06-02T10:05', to: '2027-06-02T10:44' }] }], { spread: 'none', limit: 10 });
    expect(starts(s)).toEqual([['2027-06-02T10:15'], ['2027-06-02T10:30']]);
  });

  it('unites overlapping and separate stretches', () => {
    const s = scenario(
      [
        {
          steps: [...steps],
          allowedStarts: [
            { from: '2027-06-03T12:00', to: '2027-06-03T12:30' },
            { from: '2027-06-02T16:00', to: '2027-06-02T16:15' },
            { from: '2027-06-03T12:15', to: '2027-06-03T12:45' },
          ],
        },
      ],
      { spread: 'none', limit: 10 },
    );
    // On June 2 a sitting (60 minutes at least) from 16:00 ends at closing time; from 16:15 it would not.
    expect(starts(s)).toEqual([['2027-06-02T16:00'], ['2027-06-03T12:00'], ['2027-06-03T12:15'], ['2027-06-03T12:30'], ['2027-06-03T12:45']]);
  });

  it('limits a later sitting: the first sitting moves so the second can start inside its stretch', () => {
    const s = scenario(
      [
        { steps: [...steps] },
        {
          daysAfterPrevious: { min: 1, max: 2 },
          steps: [{ kind: 'hands_on', minutes: 30 }],
          allowedStarts: [{ from: '2027-06-05T14:00', to: '2027-06-07T23:59' }],
        },
      ],
      { limit: 2 },
    );
    // The second sitting may start from June 5 14:00, so the first can be no earlier than June 3 (two days before).
    expect(starts(s)).toEqual([
      ['2027-06-03T09:00', '2027-06-05T14:00'],
      ['2027-06-04T09:00', '2027-06-05T14:00'],
    ]);
  });

  it('with no stretch at all, allows no start', () => {
    expect(starts(scenario([{ steps: [...steps], allowedStarts: [] }]))).toEqual([]);
  });

  it('names the field of a stretch that ends before it starts, or starts in a spring-forward gap', () => {
    const bad = (allowedStarts: Array<{ from: string; to: string }>) => () => parseScenario(scenario([{ steps: [...steps], allowedStarts }]));
    expect(bad([{ from: '2027-06-02T10:00', to: '2027-06-01T10:00' }])).toThrow(expect.objectContaining({ field: 'request.sittings[0].allowedStarts[0].to' }));
    // 2027-03-14 02:30 does not exist in America/Denver (IANA tz database: clocks go from 02:00 to 03:00).
    expect(
      bad([
        { from: '2027-06-01T10:00', to: '2027-06-02T10:00' },
        { from: '2027-03-14T02:30', to: '2027-06-02T10:00' },
      ]),
    ).toThrow(ScenarioError);
    expect(
      bad([
        { from: '2027-06-01T10:00', to: '2027-06-02T10:00' },
        { from: '2027-03-14T02:30', to: '2027-06-02T10:00' },
      ]),
    ).toThrow(expect.objectContaining({ field: 'request.sittings[0].allowedStarts[1].from' }));
  });
});

describe('step ids and labels', () => {
  it('come back on each planned step, sitting by sitting, exactly as the request gave them', () => {
    const s = scenario(
      [
        {
          steps: [
            { kind: 'hands_on', minutes: 30, id: '1.1', label: 'Apply colour' },
            { kind: 'developing', minMinutes: 15, maxMinutes: 30, id: '1.2', label: 'Colour develops' },
            { kind: 'basin', minutes: 15, id: '1.3', label: 'Rinse' },
          ],
        },
        { daysAfterPrevious: { min: 1, max: 2 }, steps: [{ kind: 'hands_on', minutes: 45, id: '2.1', label: 'Tone and dry' }] },
      ],
      { limit: 1 },
    );
    const option = planOptions(parseScenario(s)).options[0]!;
    expect(option.sittings.map((x) => x.steps.map((st) => [st.kind, st.id, st.label]))).toEqual([
      [
        ['hands_on', '1.1', 'Apply colour'],
        ['developing', '1.2', 'Colour develops'],
        ['basin', '1.3', 'Rinse'],
      ],
      [['hands_on', '2.1', 'Tone and dry']],
    ]);
  });

  it('are left out of the answer when the request has none', () => {
    const option = planOptions(parseScenario(scenario([{ steps: [...steps] }]))).options[0]!;
    for (const st of option.sittings[0]!.steps)
      expect(Object.keys(st).sort()).toEqual(st.kind === 'basin' ? ['basin', 'end', 'kind', 'start'] : ['end', 'kind', 'start']);
  });
});
