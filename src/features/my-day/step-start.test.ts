import { describe, expect, it } from 'vitest';
import type { DayRunSittingView } from '@shared/schemas/replan.schemas';
import { stepStartNow } from './step-start';

const run: DayRunSittingView = {
  bookingId: 'b',
  seq: 1,
  moved: true,
  steps: [
    { start: '2027-06-09T13:00-06:00', end: '2027-06-09T13:20-06:00', state: 'finished' },
    { start: '2027-06-09T13:20-06:00', end: '2027-06-09T14:15-06:00', state: 'running' },
    { start: '2027-06-09T14:15-06:00', end: '2027-06-09T14:25-06:00', state: 'planned' },
  ],
};

describe('when a step now starts', () => {
  it('is the re-planned start when the day runs late, with the planned one beside it', () => {
    expect(stepStartNow('2027-06-09T20:00:00.000Z', run, 2)).toEqual({ at: '2027-06-09T14:15-06:00', planned: '2027-06-09T20:00:00.000Z' });
  });
  it('is the planned start when the re-plan keeps it (the same instant in another spelling), or without a re-plan', () => {
    expect(stepStartNow('2027-06-09T19:20:00Z', run, 1)).toEqual({ at: '2027-06-09T19:20:00Z', planned: null });
    expect(stepStartNow('2027-06-09T20:00:00Z', undefined, 2)).toEqual({ at: '2027-06-09T20:00:00Z', planned: null });
    expect(stepStartNow('2027-06-09T20:00:00Z', run, 7)).toEqual({ at: '2027-06-09T20:00:00Z', planned: null });
  });
});
