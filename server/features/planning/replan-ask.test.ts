import { describe, expect, it } from 'vitest';
import { parseScenario, replanDay, type ReplanAnswer } from '@shared/engine/engine';
import type { DayRunSitting } from './day-runs.repository';
import { bookableSteps, followTheRun, fromAnswer, replanAsk, stylistsUnderWay, type RunBook } from './replan-ask';

// America/Denver on 2027-06-09 is MDT, UTC−6 (IANA tz database): 12:00 local is 18:00Z.
const ZONE = 'America/Denver';
const local = (hhmm: string) => new Date(`2027-06-09T${hhmm}:00-06:00`);
const hours = [{ rrule: 'FREQ=DAILY', start: '09:00', end: '19:00' }];

/**
 * Ana's 12:00 sitting (apply, develop 20–40 min booked at 40, rinse) and her 13:10 cut. The apply ran ten minutes over
 * and the develop started at 12:30: at 12:45 the rinse now runs 13:10–13:20, into the cut.
 */
const scenario = parseScenario({
  timeZone: ZONE,
  granularityMinutes: 5,
  horizon: { from: '2027-06-09', to: '2027-06-11' },
  salonHours: hours,
  stylists: [
    { id: 'ana', skills: ['colour'], maxClientsAtOnce: 2, hours },
    { id: 'bo', skills: ['colour'], maxClientsAtOnce: 2, hours },
  ],
  chairs: [{ id: 'c1' }, { id: 'c2' }],
  basins: [{ id: 'b1' }, { id: 'b2' }],
  bookings: [
    {
      id: 'r',
      stylist: 'ana',
      chair: 'c1',
      steps: [
        { kind: 'hands_on', start: '2027-06-09T12:00', end: '2027-06-09T12:20' },
        { kind: 'developing', start: '2027-06-09T12:20', end: '2027-06-09T13:00' },
        { kind: 'basin', start: '2027-06-09T13:00', end: '2027-06-09T13:10', basin: 'b1' },
      ],
    },
    { id: 'l', stylist: 'ana', chair: 'c2', steps: [{ kind: 'hands_on', start: '2027-06-09T13:10', end: '2027-06-09T13:40' }] },
  ],
});
const book: RunBook = {
  bookings: scenario.bookings,
  stepIds: new Map([
    ['r', ['r-apply', 'r-develop', 'r-rinse']],
    ['l', ['l-cut']],
  ]),
};
const step = (id: string, seq: number, label: string, more: Partial<DayRunSitting['steps'][number]> = {}) => ({
  id,
  seq,
  label,
  actualStart: null,
  actualEnd: null,
  minMinutes: null,
  maxMinutes: null,
  ...more,
});
// The run lists the steps in another order than the book: they are matched by id.
const runs: DayRunSitting[] = [
  {
    id: 'r',
    bookingId: 'booking-r',
    stylistId: 'ana',
    status: 'in_progress',
    skill: 'colour',
    sittingsInBooking: 1,
    steps: [
      step('r-rinse', 3, 'Rinse'),
      step('r-develop', 2, 'Develops', { actualStart: local('12:30'), minMinutes: 20, maxMinutes: 40 }),
      step('r-apply', 1, 'Apply', { actualStart: local('12:00'), actualEnd: local('12:30') }),
    ],
  },
  { id: 'l', bookingId: 'booking-l', stylistId: 'ana', status: 'booked', skill: 'colour', sittingsInBooking: 1, steps: [step('l-cut', 1, 'Cut')] },
];

describe('the re-plan ask the planning port builds', () => {
  it('names each step by its place in the book’s own list of step ids, with its id, label, actual times and range', () => {
    const ask = replanAsk('ana', new Date(local('12:45').getTime() + 30_000), ZONE, 15, runs, book);
    expect(ask).toMatchObject({ stylist: 'ana', now: '2027-06-09T12:45', lateStartLimitMinutes: 15 });
    expect(ask.sittings?.[0]).toEqual({
      booking: 'r',
      skill: 'colour',
      steps: [
        { step: 2, id: 'r-rinse', label: 'Rinse' },
        { step: 1, id: 'r-develop', label: 'Develops', actualStart: '2027-06-09T12:30', minMinutes: 20, maxMinutes: 40 },
        { step: 0, id: 'r-apply', label: 'Apply', actualStart: '2027-06-09T12:00', actualEnd: '2027-06-09T12:30' },
      ],
    });
  });

  it('maps the engine’s answer back to sitting and step ids: the conflict, each fix, the re-planned steps', () => {
    const answer = fromAnswer(replanDay(scenario, replanAsk('ana', local('12:45'), ZONE, 15, runs, book)), book.stepIds);
    expect(answer.sittings.map((s) => [s.sittingId, s.steps.map((st) => [st.stepId, st.state])])).toEqual([
      [
        'r',
        [
          ['r-apply', 'finished'],
          ['r-develop', 'running'],
          ['r-rinse', 'planned'],
        ],
      ],
      ['l', [['l-cut', 'planned']]],
    ]);
    expect(answer.conflicts).toHaveLength(1);
    const [conflict] = answer.conflicts;
    expect(conflict).toMatchObject({ kind: 'hands', sittingId: 'l', causeId: 'r', minutes: 10 });
    expect(conflict!.fixes.map((f) => f.fix)).toEqual([
      // Develop 30 min from 12:30, so the rinse ends at 13:10, as the cut starts.
      { kind: 'developing', sittingId: 'r', stepId: 'r-develop', minutes: 30 },
      { kind: 'hand_over', sittingId: 'l', stylistId: 'bo' },
      { kind: 'late_start', sittingId: 'l', minutesLate: 10, start: '2027-06-09T13:20-06:00' },
      { kind: 'another_day', sittingId: 'l' },
    ]);
    // The developing fix carries the sitting as it would then run; the book can hold its unfinished steps.
    const developing = conflict!.fixes[0]!;
    expect(bookableSteps(developing.steps!, ZONE, 5)).toEqual([
      { id: 'r-develop', start: local('12:30'), end: local('13:00') },
      { id: 'r-rinse', start: local('13:00'), end: local('13:10') },
    ]);
  });

  it('a sitting of a booking with several sittings is never handed over: the hand-over is left out and the conflict says so', () => {
    const answer = replanDay(scenario, replanAsk('ana', local('12:45'), ZONE, 15, runs, book));
    const [kept] = fromAnswer(answer, book.stepIds, new Set(['l'])).conflicts;
    expect(kept!.fixes.map((f) => f.fix.kind)).toEqual(['developing', 'late_start', 'another_day']);
    expect(kept!.handOverHeld).toBe(true);
    expect(fromAnswer(answer, book.stepIds).conflicts[0]!.handOverHeld).toBeUndefined();
  });

  it('a running step that started off the grid is booked from the next grid point, so it reads back to the same end', () => {
    const steps = bookableSteps(
      [
        {
          stepId: 's',
          label: 'Develops',
          kind: 'developing',
          start: '2027-06-09T12:32:00-06:00',
          end: '2027-06-09T13:00:00-06:00',
          state: 'running',
          basinId: null,
        },
      ],
      ZONE,
      5,
    );
    expect(steps).toEqual([{ id: 's', start: local('12:35'), end: local('13:00') }]);
  });

  it('a basin fix names its step by the engine’s place in the scenario’s booking, read through the book’s ids', () => {
    const answer: ReplanAnswer = {
      stylist: 'ana',
      now: '2027-06-09T12:45:00-06:00',
      sittings: [],
      conflicts: [
        {
          kind: 'basin',
          booking: 'l',
          with: 'r',
          minutes: 5,
          start: '2027-06-09T13:05:00-06:00',
          end: '2027-06-09T13:10:00-06:00',
          fixes: [{ kind: 'basin', booking: 'r', step: 2, basin: 'b2' }],
        },
      ],
      freed: [],
    };
    expect(fromAnswer(answer, book.stepIds).conflicts[0]!.fixes).toEqual([{ fix: { kind: 'basin', sittingId: 'r', stepId: 'r-rinse', basinId: 'b2' } }]);
  });

  it('a finished sitting keeps only the steps that ran (the client has left); days under way are those with a started step', () => {
    const finished: DayRunSitting = {
      ...runs[0]!,
      status: 'finished',
      steps: [
        step('r-apply', 1, 'Apply', { actualStart: local('12:00'), actualEnd: local('12:20') }),
        step('r-develop', 2, 'Develops'),
        step('r-rinse', 3, 'Rinse'),
      ],
    };
    const asRun = followTheRun(book, [finished, runs[1]!]);
    expect(asRun.bookings.find((b) => b.id === 'r')!.steps).toEqual([{ kind: 'hands_on', start: '2027-06-09T12:00', end: '2027-06-09T12:20' }]);
    expect(asRun.stepIds.get('r')).toEqual(['r-apply']);
    expect(asRun.bookings.find((b) => b.id === 'l')).toBe(book.bookings[1]);
    expect(stylistsUnderWay([finished, runs[1]!])).toEqual(['ana']);
    expect(stylistsUnderWay([runs[1]!])).toEqual([]);
  });
});
