/** The validator must catch broken plans, or the property tests' soundness check proves nothing. */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseScenario, planOptions, type Option } from '@shared/engine/engine';
import { bookedForCheck, validateDay, validateOption } from './plan-validator';
import { overrunDay } from './replan-day-scenario';

const scenario = parseScenario(readFileSync(join(__dirname, '../../docs/examples/two-sitting-correction-denver.json'), 'utf8'));
const first = planOptions(scenario).options[0]!;
const tamper = (edit: (o: Option) => void): Option => {
  const copy = structuredClone(first);
  edit(copy);
  return copy;
};

describe('validateOption', () => {
  it('accepts the engine plan', () => {
    expect(validateOption(scenario, first)).toEqual([]);
  });

  it.each<[string, (o: Option) => void, RegExp]>([
    [
      'a chair held by another client',
      (o) => {
        o.sittings[0]!.chair = 'chair-1';
      },
      /rule 2/,
    ],
    [
      "hands work over the other client's application",
      (o) => {
        o.sittings[0]!.steps[0]!.start = '2027-03-03T10:40-07:00';
      },
      /rule 4/,
    ],
    [
      'developing past its maximum',
      (o) => {
        o.sittings[0]!.steps[1]!.end = '2027-03-03T12:05-07:00';
        o.sittings[0]!.steps[2]!.start = '2027-03-03T12:05-07:00';
        o.sittings[0]!.steps[2]!.end = '2027-03-03T12:20-07:00';
      },
      /rule 1/,
    ],
    [
      'a gap between steps',
      (o) => {
        o.sittings[0]!.steps[2]!.start = '2027-03-03T11:45-07:00';
        o.sittings[0]!.steps[2]!.end = '2027-03-03T12:00-07:00';
      },
      /rule 1: gap/,
    ],
    [
      'the second sitting on the same day',
      (o) => {
        o.sittings[1]!.steps[0]!.start = '2027-03-03T15:00-07:00';
        o.sittings[1]!.steps[0]!.end = '2027-03-03T16:00-07:00';
      },
      /rule 7/,
    ],
    [
      'a sitting outside working hours',
      (o) => {
        o.sittings[1]!.steps[0]!.start = '2027-03-04T18:30-07:00';
        o.sittings[1]!.steps[0]!.end = '2027-03-04T19:30-07:00';
      },
      /rule 6: outside working hours/,
    ],
    [
      'a wrong UTC offset',
      (o) => {
        o.sittings[1]!.steps[0]!.start = '2027-03-04T11:00-06:00';
        o.sittings[1]!.steps[0]!.end = '2027-03-04T12:00-06:00';
      },
      /wrong offset/,
    ],
  ])('rejects %s', (_what, edit, rule) => {
    expect(validateOption(scenario, tamper(edit)).join('\n')).toMatch(rule);
  });
});

describe('validateDay', () => {
  const day = overrunDay();
  const checks = day.bookings.map((b) => bookedForCheck(day, b));
  const shift = (minutes: number) =>
    checks.map((x) =>
      x.id === 'lightening' ? { ...x, steps: x.steps.map((step) => ({ ...step, start: step.start + minutes, end: step.end + minutes })) } : x,
    );

  it('finds nothing wrong with the day as booked', () => {
    expect(validateDay(day, checks, new Set(['lightening']))).toEqual([]);
  });

  it('counts the minutes of hands work at once, clients beyond the cap and a chair held twice', () => {
    const shifted = shift(30).map((x) => (x.id === 'three-pm' ? { ...x, chair: 'chair-1' } : x));
    const found = validateDay(day, shifted, new Set(['lightening']));
    expect(found).toContainEqual({ kind: 'hands', booking: 'three-pm', with: 'lightening', minutes: 15 });
    expect(found).toContainEqual({ kind: 'chair', booking: 'three-pm', with: 'lightening', minutes: 15 });
    const capped = overrunDay({ stylists: day.stylists.map((st) => ({ ...st, maxClientsAtOnce: 1 })) });
    expect(validateDay(capped, shift(30), new Set(['lightening']))).toContainEqual({ kind: 'clients', booking: 'three-pm', with: 'lightening', minutes: 15 });
  });

  it('counts minutes after closing, and leaves out minutes where both sides are finished', () => {
    // Moved to 16:30–19:15: Ava works until 18:00, the salon closes at 19:00.
    const found = validateDay(day, shift(270), new Set(['lightening']));
    expect(found).toContainEqual({ kind: 'hours', booking: 'lightening', minutes: 75 });
    expect(found).toContainEqual({ kind: 'closing', booking: 'lightening', minutes: 15 });
    const finished = shift(30).map((x) => ({ ...x, steps: x.steps.map((step) => ({ ...step, finished: true })) }));
    expect(validateDay(day, finished, new Set(['lightening', 'three-pm']))).toEqual([]);
  });
});
