import { describe, expect, it } from 'vitest';
import { parseScenario, planOptions } from '@shared/engine/engine';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { toEngineSittings } from './engine-request';
import { placedOption } from './placed-option';

const plan: StepPlan = {
  sittings: [
    {
      steps: [
        { kind: 'hands_on', label: 'Apply lightener', product: 'lightener', minutes: 20 },
        { kind: 'developing', label: 'Lightener lifts', product: 'lightener', minMinutes: 30, maxMinutes: 40 },
      ],
    },
    { daysAfterPrevious: { min: 1, max: 3 }, steps: [{ kind: 'basin', label: 'Rinse and tone', product: 'toner_direct', minutes: 15 }] },
  ],
};
const ZONE = 'America/Denver';
const at = (iso: string) => new Date(iso);

describe('the engine request the planning port sends', () => {
  it('tags every step with its place in the plan and its label, and the engine hands both back', () => {
    const sittings = toEngineSittings(plan, ZONE);
    expect(sittings.map((s) => s.steps.map((st) => [st.id, st.label]))).toEqual([
      [
        ['1.1', 'Apply lightener'],
        ['1.2', 'Lightener lifts'],
      ],
      [['2.1', 'Rinse and tone']],
    ]);
    const daily = [{ rrule: 'FREQ=DAILY', start: '09:00', end: '17:00' }];
    const answer = planOptions(
      parseScenario({
        timeZone: ZONE,
        granularityMinutes: 5,
        horizon: { from: '2027-06-01', to: '2027-06-08' },
        salonHours: daily,
        stylists: [{ id: 'ana', skills: ['colour'], hours: daily }],
        chairs: [{ id: 'c1' }],
        basins: [{ id: 'b1' }],
        request: { skill: 'colour', stylist: null, earliest: '2027-06-01T09:00', sittings, limit: 1, spread: 'day' },
      }),
    );
    const placed = placedOption(answer.options[0]!);
    expect(placed.sittings.map((s) => s.steps.map((st) => [st.id, st.kind, st.label]))).toEqual([
      [
        ['1.1', 'hands_on', 'Apply lightener'],
        ['1.2', 'developing', 'Lightener lifts'],
      ],
      [['2.1', 'basin', 'Rinse and tone']],
    ]);
  });

  it('turns start limits into local text never wider than the instants, only for the sittings that have them', () => {
    const sittings = toEngineSittings(plan, ZONE, [null, [{ from: at('2027-06-03T15:00:30.500Z'), to: at('2027-06-20T18:59:59Z') }]]);
    expect(sittings[0]?.allowedStarts).toBeUndefined();
    // 15:00:30.5Z rounds up to 15:01Z = 09:01 MDT; 18:59:59Z rounds down to 18:59Z = 12:59 MDT.
    expect(sittings[1]?.allowedStarts).toEqual([{ from: '2027-06-03T09:01', to: '2027-06-20T12:59' }]);
  });

  it('moves a start limit out of the hour repeated when clocks go back, which the engine reads as its first pass', () => {
    // IANA tz database: America/Denver goes from 02:00 MDT back to 01:00 MST at 08:00Z on 2027-11-07. 08:30Z is the
    // second 01:30; the engine would read "01:30" as 07:30Z (MDT), an hour early, so the limit starts at 02:00 MST.
    const [sitting] = toEngineSittings({ sittings: [plan.sittings[0]!] }, ZONE, [[{ from: at('2027-11-07T08:30:00Z'), to: at('2027-11-08T00:00:00Z') }]]);
    expect(sitting?.allowedStarts).toEqual([{ from: '2027-11-07T02:00', to: '2027-11-07T17:00' }]);
    // The first 01:30 (07:30Z) is read exactly.
    const [first] = toEngineSittings({ sittings: [plan.sittings[0]!] }, ZONE, [[{ from: at('2027-11-07T07:30:00Z'), to: at('2027-11-08T00:00:00Z') }]]);
    expect(first?.allowedStarts?.[0]?.from).toBe('2027-11-07T01:30');
  });

  it('leaves out a stretch shorter than a minute (nothing may start in it)', () => {
    const [sitting] = toEngineSittings({ sittings: [plan.sittings[0]!] }, ZONE, [[{ from: at('2027-06-03T15:00:10Z'), to: at('2027-06-03T15:00:50Z') }]]);
    expect(sitting?.allowedStarts).toEqual([]);
  });
});
