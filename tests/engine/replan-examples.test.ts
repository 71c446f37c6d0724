/**
 * Worked examples of re-planning a day (tests/engine/replan-day-scenario.ts): Ava's lightening client from 12:00
 * (application 12:00–13:00, lightener developing 13:00–14:00, rinse 14:00–14:15, finish 14:15–14:45) and her
 * 15:00 client in another chair. Times are Europe/London summer time (+01:00, IANA tz).
 */
import { describe, expect, it } from 'vitest';
import { replanDay, ScenarioError, type ReplanAskInput } from '@shared/engine/engine';
import { at, overrunDay } from './replan-day-scenario';

const t = (time: string) => `2027-06-09T${time}+01:00`;
const applied = { step: 0, actualStart: at('12:00'), actualEnd: at('13:00') };
/** The lightener still processing at `now`: it was due out at 14:00. */
const lightenerRunning = (now: string, more: Partial<ReplanAskInput> = {}): ReplanAskInput => ({
  stylist: 'ava',
  now: at(now),
  sittings: [
    { booking: 'lightening', steps: [applied, { step: 1, actualStart: at('13:00'), id: 'lightener', label: 'Lightener' }] },
    { booking: 'three-pm', skill: 'colour' },
  ],
  ...more,
});

describe('re-planning a day: worked examples', () => {
  it('a 30-minute lightener overrun pushes the finish into the 3 pm application: a hands conflict of 15 minutes', () => {
    const answer = replanDay(overrunDay(), lightenerRunning('14:30'));
    expect(answer.sittings[0]).toMatchObject({ booking: 'lightening', inProgress: true, moved: true });
    expect(answer.sittings[0]!.steps).toEqual([
      { kind: 'hands_on', start: t('12:00'), end: t('13:00'), state: 'finished' },
      { kind: 'developing', start: t('13:00'), end: t('14:30'), state: 'running', id: 'lightener', label: 'Lightener' },
      { kind: 'basin', start: t('14:30'), end: t('14:45'), state: 'planned', basin: 'basin-1' },
      { kind: 'hands_on', start: t('14:45'), end: t('15:15'), state: 'planned' },
    ]);
    expect(answer.sittings[1]).toMatchObject({ booking: 'three-pm', inProgress: false, moved: false });
    const [conflict, ...others] = answer.conflicts;
    expect(others).toEqual([]);
    expect(conflict).toMatchObject({ kind: 'hands', booking: 'three-pm', with: 'lightening', minutes: 15, start: t('15:00'), end: t('15:15') });
    // A fixed-length lightener has no developing flexibility; Ben is free with the skill; 15 minutes late is within
    // the default limit of 15 (common practice for a salon's late-start allowance).
    expect(conflict!.fixes).toEqual([
      { kind: 'hand_over', booking: 'three-pm', stylist: 'ben' },
      { kind: 'late_start', booking: 'three-pm', start: t('15:15'), minutesLate: 15 },
      { kind: 'another_day', booking: 'three-pm' },
    ]);
    expect(answer.freed).toEqual([]);
  });

  it('a 45-minute overrun needs 30 minutes: no late start within 15, but one within a 30-minute limit', () => {
    const [conflict] = replanDay(overrunDay(), lightenerRunning('14:45')).conflicts;
    expect(conflict).toMatchObject({ kind: 'hands', booking: 'three-pm', minutes: 30 });
    expect(conflict!.fixes.map((f) => f.kind)).toEqual(['hand_over', 'another_day']);
    const [wider] = replanDay(overrunDay(), lightenerRunning('14:45', { lateStartLimitMinutes: 30 })).conflicts;
    expect(wider!.fixes).toContainEqual({ kind: 'late_start', booking: 'three-pm', start: t('15:30'), minutesLate: 30 });
  });

  it('developing flexibility comes first: a slow application is caught up by a shorter lightener', () => {
    const answer = replanDay(overrunDay(), {
      stylist: 'ava',
      now: at('13:30'),
      sittings: [
        {
          booking: 'lightening',
          steps: [
            { ...applied, actualEnd: at('13:30') },
            { step: 1, minMinutes: 45, maxMinutes: 70, label: 'Lightener' },
          ],
        },
        { booking: 'three-pm', skill: 'colour' },
      ],
    });
    const [conflict] = answer.conflicts;
    expect(conflict).toMatchObject({ kind: 'hands', booking: 'three-pm', minutes: 15 });
    expect(conflict!.fixes[0]).toEqual({
      kind: 'developing',
      booking: 'lightening',
      step: 1,
      label: 'Lightener',
      minutes: 45,
      steps: [
        { kind: 'hands_on', start: t('12:00'), end: t('13:30'), state: 'finished' },
        { kind: 'developing', start: t('13:30'), end: t('14:15'), state: 'planned', label: 'Lightener' },
        { kind: 'basin', start: t('14:15'), end: t('14:30'), state: 'planned', basin: 'basin-1' },
        { kind: 'hands_on', start: t('14:30'), end: t('15:00'), state: 'planned' },
      ],
    });
    expect(conflict!.fixes.map((f) => f.kind)).toEqual(['developing', 'hand_over', 'late_start', 'another_day']);
  });

  it('a running developing step is never shortened to before now, and is stretched when that clears the hands', () => {
    // At 14:30 the lightener (40–165 minutes) cannot end before 14:30; stretching it to 15:45 puts the rinse and
    // finish after the 3 pm application (15:00–15:45), while the 3 pm client develops (here until 16:30).
    const { bookings } = overrunDay();
    const lightening = bookings[0]!;
    const threePm = bookings[1]!;
    const longer = threePm.steps.map((step, k) =>
      k === 0 ? step : { ...step, start: at(['15:45', '16:30', '16:45'][k - 1]!), end: at(['16:30', '16:45', '17:15'][k - 1]!) },
    ) as typeof threePm.steps;
    const answer = replanDay(
      overrunDay({ bookings: [lightening, { ...threePm, steps: longer }] }),
      lightenerRunning('14:30', {
        sittings: [
          { booking: 'lightening', steps: [applied, { step: 1, actualStart: at('13:00'), minMinutes: 40, maxMinutes: 165 }] },
          { booking: 'three-pm', skill: 'colour' },
        ],
      }),
    );
    const developing = answer.conflicts[0]!.fixes[0]!;
    expect(developing).toMatchObject({ kind: 'developing', step: 1, minutes: 165 });
    if (developing.kind !== 'developing') throw new Error('expected a developing fix');
    expect(developing.steps.slice(1).map((s) => [s.start, s.end])).toEqual([
      [t('13:00'), t('15:45')],
      [t('15:45'), t('16:00')],
      [t('16:00'), t('16:30')],
    ]);
  });

  it('offers no hand-over when nobody with the skill is free, nor without the skill given', () => {
    const busyBen = overrunDay({
      bookings: [
        ...overrunDay().bookings,
        { id: 'ben-3pm', stylist: 'ben', chair: 'chair-3', steps: [{ kind: 'hands_on', start: at('15:30'), end: at('16:00') }] },
      ],
    });
    expect(replanDay(busyBen, lightenerRunning('14:30')).conflicts[0]!.fixes.map((f) => f.kind)).toEqual(['late_start', 'another_day']);
    const noSkill = lightenerRunning('14:30');
    noSkill.sittings = noSkill.sittings!.slice(0, 1);
    expect(replanDay(overrunDay(), noSkill).conflicts[0]!.fixes.map((f) => f.kind)).toEqual(['late_start', 'another_day']);
  });

  it('a chair and a basin needed by other stylists: another chair or basin for them', () => {
    const s = overrunDay({
      bookings: [
        ...overrunDay().bookings,
        { id: 'cy-cut', stylist: 'cy', chair: 'chair-1', steps: [{ kind: 'hands_on', start: at('15:00'), end: at('15:30') }] },
        { id: 'ben-rinse', stylist: 'ben', chair: 'chair-3', steps: [{ kind: 'basin', start: at('14:30'), end: at('14:45'), basin: 'basin-1' }] },
      ],
    });
    const conflicts = replanDay(s, lightenerRunning('14:30')).conflicts;
    const chair = conflicts.find((c) => c.kind === 'chair')!;
    expect(chair).toMatchObject({ booking: 'cy-cut', with: 'lightening', minutes: 15, start: t('15:00'), end: t('15:15') });
    // chair-2 is the 3 pm client's from 15:00.
    expect(chair.fixes[0]).toEqual({ kind: 'chair', booking: 'cy-cut', chair: 'chair-3' });
    const basin = conflicts.find((c) => c.kind === 'basin')!;
    expect(basin).toMatchObject({ booking: 'ben-rinse', with: 'lightening', minutes: 15 });
    expect(basin.fixes).toEqual([
      { kind: 'basin', booking: 'ben-rinse', step: 0, basin: 'basin-2' },
      { kind: 'basin', booking: 'lightening', step: 2, basin: 'basin-2' },
      { kind: 'late_start', booking: 'ben-rinse', start: t('14:45'), minutesLate: 15 },
      { kind: 'another_day', booking: 'ben-rinse' },
    ]);
  });

  it('running past the stylist’s hours and the closing time names the running sitting itself', () => {
    const late = overrunDay({ salonHours: [{ rrule: 'FREQ=DAILY', start: '09:00', end: '15:00' }] });
    const conflicts = replanDay(late, lightenerRunning('14:30')).conflicts.filter((c) => c.booking === 'lightening');
    expect(conflicts).toEqual([{ kind: 'closing', booking: 'lightening', minutes: 15, start: t('15:00'), end: t('15:15'), fixes: [] }]);
  });

  it('an early finish frees the stylist’s hands minutes from now on', () => {
    const answer = replanDay(overrunDay(), {
      stylist: 'ava',
      now: at('12:40'),
      sittings: [{ booking: 'lightening', steps: [{ step: 0, actualStart: at('12:02'), actualEnd: at('12:37') }] }],
    });
    // The lightener goes on at the next grid point after the tap (12:40) and keeps its 60 minutes.
    expect(answer.sittings[0]!.steps.map((s) => [s.start, s.end, s.state])).toEqual([
      [t('12:02'), t('12:37'), 'finished'],
      [t('12:40'), t('13:40'), 'planned'],
      [t('13:40'), t('13:55'), 'planned'],
      [t('13:55'), t('14:25'), 'planned'],
    ]);
    expect(answer.freed).toEqual([
      { start: t('12:40'), end: t('13:00'), minutes: 20 },
      { start: t('14:25'), end: t('14:45'), minutes: 20 },
    ]);
    expect(answer.conflicts).toEqual([]);
  });

  it.each<[string, (ask: ReplanAskInput) => void, string]>([
    [
      'an end before its start',
      (a) => (a.sittings![0]!.steps![0] = { step: 0, actualStart: at('12:30'), actualEnd: at('12:10') }),
      'ask.sittings[0].steps[0].actualEnd',
    ],
    ['a time after now', (a) => (a.now = at('12:50')), 'ask.sittings[0].steps[0].actualEnd'],
    ['a step started before the one before it', (a) => (a.sittings![0]!.steps = [{ step: 1, actualStart: at('13:00') }]), 'ask.sittings[0].steps'],
    ['a step out of range', (a) => (a.sittings![0]!.steps = [{ step: 4, actualStart: at('13:00') }]), 'ask.sittings[0].steps[0].step'],
    ['a booking on another day', (a) => (a.now = '2027-06-10T10:00'), 'ask.sittings[0].booking'],
    ['a range on a hands-on step', (a) => (a.sittings![0]!.steps = [{ step: 0, minMinutes: 5, maxMinutes: 10 }]), 'ask.sittings[0].steps[0].minMinutes'],
    ['an unknown stylist', (a) => (a.stylist = 'zed'), 'ask.stylist'],
  ])('refuses %s, naming the field', (_what, edit, field) => {
    const ask = lightenerRunning('14:30');
    edit(ask);
    let error: unknown;
    try {
      replanDay(overrunDay(), ask);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(ScenarioError);
    expect((error as ScenarioError).field).toBe(field);
  });
});
