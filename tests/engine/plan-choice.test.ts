/**
 * How the engine picks one plan when several share a (stylist, start) pair — the rule documented
 * in docs/engine.md: least fragmented hands time, then hands work inside other clients'
 * developing time, then the shortest sitting, then the best-fitting chair.
 */
import { describe, expect, it } from 'vitest';
import { parseScenario, planOptions, type ScenarioInput } from '@shared/engine/engine';

const day = '2027-06-02';
const at = (hhmm: string) => `${day}T${hhmm}`;

function scenario(extra: Partial<ScenarioInput>): ScenarioInput {
  return {
    timeZone: 'Europe/London',
    granularityMinutes: 5,
    horizon: { from: day, to: '2027-06-03' },
    salonHours: [{ rrule: 'FREQ=DAILY', start: '09:00', end: '18:00' }],
    stylists: [{ id: 'ana', skills: ['colour'], maxClientsAtOnce: 2, hours: [{ rrule: 'FREQ=DAILY', start: '09:00', end: '18:00' }] }],
    chairs: [{ id: 'c1' }, { id: 'c2' }, { id: 'c3' }],
    basins: [{ id: 'b1' }, { id: 'b2' }],
    ...extra,
  };
}

const request = (sittingSteps: unknown[], earliest = at('09:00')) =>
  ({ skill: 'colour', earliest, limit: 1, sittings: [{ steps: sittingSteps }] }) as ScenarioInput['request'];

describe('plan choice for a given (stylist, start)', () => {
  it('stretches developing so the basin step joins existing hands work (fewer hands-busy stretches)', () => {
    // Another client's basin runs 10:30-10:45; our basin at 10:15 ends exactly where theirs starts.
    const s = parseScenario(
      scenario({
        bookings: [{ id: 'k', stylist: 'ana', chair: 'c1', steps: [{ kind: 'basin', start: at('10:30'), end: at('10:45'), basin: 'b1' }] }],
        request: request([
          { kind: 'hands_on', minutes: 30 },
          { kind: 'developing', minMinutes: 20, maxMinutes: 45 },
          { kind: 'basin', minutes: 15 },
        ]),
      }),
    );
    const steps = planOptions(s).options[0]!.sittings[0]!.steps;
    expect(steps.map((x) => [x.kind, x.start.slice(11, 16), x.end.slice(11, 16)])).toEqual([
      ['hands_on', '09:00', '09:30'],
      ['developing', '09:30', '10:15'],
      ['basin', '10:15', '10:30'],
    ]);
    // b1 is free until 10:30, a tighter fit than the all-day-free b2.
    expect(steps[2]!.basin).toBe('b1');
  });

  it('with nothing to join, takes the shortest developing time', () => {
    const s = parseScenario(
      scenario({
        request: request([
          { kind: 'hands_on', minutes: 30 },
          { kind: 'developing', minMinutes: 20, maxMinutes: 45 },
          { kind: 'hands_on', minutes: 15 },
        ]),
      }),
    );
    expect(planOptions(s).options[0]!.sittings[0]!.steps[1]!.end.slice(11, 16)).toBe('09:50');
  });

  it("puts hands work inside another client's developing time when fragmentation ties", () => {
    // Another client develops 10:00-11:00 (chair c1). Ending developing at 10:00 or later keeps one
    // new stretch either way; 10:00 puts all 15 hands minutes in their developing time.
    const s = parseScenario(
      scenario({
        bookings: [
          {
            id: 'k',
            stylist: 'ana',
            chair: 'c1',
            steps: [
              { kind: 'hands_on', start: at('08:00'), end: at('08:30') },
              { kind: 'developing', start: at('10:00'), end: at('11:00') },
            ],
          },
        ],
        request: request([
          { kind: 'developing', minMinutes: 30, maxMinutes: 75 },
          { kind: 'hands_on', minutes: 15 },
        ]),
      }),
    );
    const steps = planOptions(s).options[0]!.sittings[0]!.steps;
    expect(steps[1]!.start.slice(11, 16)).toBe('10:00');
  });

  it('picks the chair whose free stretch is shortest (best fit), keeping long stretches whole', () => {
    // c2 is booked from 10:00, so its free stretch 09:00-10:00 fits a 30-minute sitting most tightly.
    const s = parseScenario(
      scenario({
        stylists: [
          { id: 'ana', skills: ['colour'], hours: [{ rrule: 'FREQ=DAILY', start: '09:00', end: '18:00' }] },
          { id: 'bo', skills: [], hours: [] },
        ],
        bookings: [{ id: 'k', stylist: 'bo', chair: 'c2', steps: [{ kind: 'hands_on', start: at('10:00'), end: at('12:00') }] }],
        request: request([{ kind: 'hands_on', minutes: 30 }]),
      }),
    );
    expect(planOptions(s).options[0]!.sittings[0]!.chair).toBe('c2');
  });
});
