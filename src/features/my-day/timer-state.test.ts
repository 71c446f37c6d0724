import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import { developingTimer, sittingProgress } from './timer-state';

const at = (hhmm: string) => DateTime.fromISO(`2027-03-02T${hhmm}:00Z`);
const step = (kind: 'hands_on' | 'developing' | 'basin', from: string, to: string, min: number | null = null, max: number | null = null) => ({
  kind,
  label: kind,
  start: `2027-03-02T${from}:00Z`,
  end: `2027-03-02T${to}:00Z`,
  basinName: null,
  minMinutes: min,
  maxMinutes: max,
});

describe('developingTimer', () => {
  // Lightener planned 10:00–10:40, may come off from 30 minutes, must come off by 50.
  const lightener = step('developing', '10:00', '10:40', 30, 50);

  it('before the start: not started, the full planned minutes left', () => {
    expect(developingTimer(lightener, at('09:50'))).toEqual({ phase: 'not_started', minutesLeft: 40, minutesIn: 0 });
  });
  it('before the least time: processing, minutes left to the planned end', () => {
    expect(developingTimer(lightener, at('10:12'))).toEqual({ phase: 'processing', minutesLeft: 28, minutesIn: 12 });
  });
  it('from the least time: can be checked', () => {
    expect(developingTimer(lightener, at('10:30')).phase).toBe('can_check');
  });
  it('past the planned end but before the most time: still can be checked, nothing left', () => {
    expect(developingTimer(lightener, at('10:45'))).toEqual({ phase: 'can_check', minutesLeft: 0, minutesIn: 45 });
  });
  it('at the most time: must come off now', () => {
    expect(developingTimer(lightener, at('10:50')).phase).toBe('must_come_off');
  });
  it('without a min and max, uses the planned length for both', () => {
    const toner = step('developing', '11:00', '11:20');
    expect(developingTimer(toner, at('11:10')).phase).toBe('processing');
    expect(developingTimer(toner, at('11:20')).phase).toBe('must_come_off');
  });
});

describe('sittingProgress', () => {
  const sitting = { steps: [step('hands_on', '09:00', '10:00'), step('developing', '10:00', '10:40', 30, 50), step('basin', '10:40', '11:00')] };

  it('before the first step: upcoming', () => {
    expect(sittingProgress(sitting, at('08:00'))).toMatchObject({ state: 'upcoming', next: { kind: 'hands_on' } });
  });
  it('during a step: that step and the next', () => {
    expect(sittingProgress(sitting, at('10:05'))).toMatchObject({ state: 'in_progress', index: 1, next: { kind: 'basin' } });
  });
  it('after the last: finished', () => {
    expect(sittingProgress(sitting, at('11:30'))).toEqual({ state: 'finished' });
  });
});
