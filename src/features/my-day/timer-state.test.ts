import { DateTime } from 'luxon';
import { describe, expect, it } from 'vitest';
import { developingTimer, developingTiming, dueAlerts, sittingProgress, timerAlerts } from './timer-state';

// Times below are the plan's and the taps' own arithmetic. The processing limits they are held to are the trade's
// rules of thumb (common practice, from memory; the manufacturer's instructions come first): lightener about 50
// minutes on the hair without heat, counted from the first application until it is rinsed, and heat halves it.

const at = (hhmm: string) => DateTime.fromISO(`2027-03-02T${hhmm}:00Z`);
const iso = (hhmm: string | null) => (hhmm ? `2027-03-02T${hhmm}:00Z` : null);
type Kind = 'hands_on' | 'developing' | 'basin';
const step = (
  kind: Kind,
  from: string,
  to: string,
  more: { min?: number; max?: number; product?: 'lightener' | 'none' | 'toner_direct'; limit?: number; started?: string; ended?: string } = {},
) => ({
  kind,
  label: kind,
  start: iso(from)!,
  end: iso(to)!,
  basinName: null,
  minMinutes: more.min ?? null,
  maxMinutes: more.max ?? null,
  product: more.product ?? 'none',
  limitMinutes: more.limit ?? null,
  actualStart: iso(more.started ?? null),
  actualEnd: iso(more.ended ?? null),
});

describe('developingTimer from the plan (nothing tapped yet)', () => {
  // Lightener planned 10:00–10:40, may come off from 30 minutes, must come off by 50.
  const timing = developingTiming([step('developing', '10:00', '10:40', { min: 30, max: 50 })], 0);

  it('before the start: not started, the full planned minutes left', () => {
    expect(developingTimer(timing, at('09:50'))).toMatchObject({ phase: 'not_started', minutesLeft: 40, minutesIn: 0 });
    expect(timing.fromActual).toBe(false);
  });
  it('before the least time: processing, minutes left to the planned end', () => {
    expect(developingTimer(timing, at('10:12'))).toMatchObject({ phase: 'processing', minutesLeft: 28, minutesIn: 12 });
  });
  it('from the least time: can be checked', () => {
    expect(developingTimer(timing, at('10:30')).phase).toBe('can_check');
  });
  it('past the planned end but before the most time: still can be checked, nothing left', () => {
    expect(developingTimer(timing, at('10:45'))).toMatchObject({ phase: 'can_check', minutesLeft: 0, minutesIn: 45 });
  });
  it('at the most time: must come off now', () => {
    expect(developingTimer(timing, at('10:50')).phase).toBe('must_come_off');
  });
  it('without a min and max, uses the planned length for both', () => {
    const toner = developingTiming([step('developing', '11:00', '11:20')], 0);
    expect(developingTimer(toner, at('11:10')).phase).toBe('processing');
    expect(developingTimer(toner, at('11:20')).phase).toBe('must_come_off');
  });
});

describe('developingTimer from the real moment', () => {
  // Apply lightener planned 09:40–10:00, then it lifts 10:00–10:30 (25–30 min); the salon's lightener limit is 50.
  const plan = (applied: { started?: string; ended?: string }, developing: { started?: string } = {}) => [
    step('hands_on', '09:40', '10:00', { product: 'lightener', limit: 50, ...applied }),
    step('developing', '10:00', '10:30', { product: 'lightener', min: 25, max: 30, limit: 50, ...developing }),
    step('basin', '10:30', '10:45'),
  ];

  it('counts from the actual end of the application, not the planned start', () => {
    const timing = developingTiming(plan({ started: '09:52', ended: '10:09' }), 1);
    expect(timing.fromActual).toBe(true);
    expect(timing.from.toISO()).toBe(at('10:09').toISO());
    // 10:09 + 25 = 10:34: least time; 10:09 + 30 = 10:39: most time (the plan said 10:25 and 10:30).
    expect(developingTimer(timing, at('10:33')).phase).toBe('processing');
    expect(developingTimer(timing, at('10:34')).phase).toBe('can_check');
    expect(developingTimer(timing, at('10:39')).phase).toBe('must_come_off');
  });

  it('a tap a few seconds ahead of the screen’s clock has begun: processing, not "not started"', () => {
    const timing = developingTiming(plan({ started: '09:52', ended: '10:09' }), 1);
    expect(developingTimer(timing, at('10:09').minus({ seconds: 10 }))).toMatchObject({ phase: 'processing', minutesIn: 0, minutesLeft: 30 });
  });

  it('counts from the tap that started the step when the application has no actual end', () => {
    const timing = developingTiming(plan({}, { started: '10:04' }), 1);
    expect(timing.from.toISO()).toBe(at('10:04').toISO());
    expect(developingTimer(timing, at('10:14'))).toMatchObject({ phase: 'processing', minutesIn: 10, minutesLeft: 20 });
  });

  it('never runs past the family limit silently: counted from the first application, over time wins', () => {
    // Applied from 09:20 (a slow application): 50 minutes on the hair at 10:10, though only 10 minutes processing.
    const timing = developingTiming(plan({ started: '09:20', ended: '10:00' }), 1);
    expect(timing.productOn.toISO()).toBe(at('09:20').toISO());
    expect(developingTimer(timing, at('10:09'))).toMatchObject({ phase: 'processing', minutesOnHair: 49 });
    expect(developingTimer(timing, at('10:10'))).toMatchObject({ phase: 'over_limit', minutesOnHair: 50 });
  });

  it('raises alerts at the least time, 5 minutes before the most time and at the limit, each once due', () => {
    const timing = developingTiming(plan({ started: '09:52', ended: '10:09' }), 1);
    expect(timerAlerts(timing).map((a) => [a.kind, a.at.toUTC().toFormat('HH:mm')])).toEqual([
      ['least', '10:34'],
      ['most_soon', '10:34'],
      ['limit', '10:42'],
    ]);
    expect(dueAlerts(timing, at('10:33'))).toEqual([]);
    expect(dueAlerts(timing, at('10:35')).map((a) => a.kind)).toEqual(['least', 'most_soon']);
  });
});

describe('sittingProgress', () => {
  const [application, developing, basin] = [
    step('hands_on', '09:00', '10:00'),
    step('developing', '10:00', '10:40', { min: 30, max: 50 }),
    step('basin', '10:40', '11:00'),
  ] as const;
  const steps = [application, developing, basin];

  it('booked, before the first step: upcoming', () => {
    expect(sittingProgress({ steps, status: 'booked' }, at('08:00'))).toMatchObject({ state: 'upcoming', next: { kind: 'hands_on' } });
  });
  it('booked, during a planned step: that step and the next, by the clock', () => {
    expect(sittingProgress({ steps }, at('10:05'))).toMatchObject({ state: 'in_progress', index: 1, next: { kind: 'basin' } });
  });
  it('booked, after the last: finished', () => {
    expect(sittingProgress({ steps }, at('11:30'))).toEqual({ state: 'finished' });
  });
  it('arrived: the taps decide, whatever the clock says', () => {
    expect(sittingProgress({ steps, status: 'arrived' }, at('10:05'))).toMatchObject({ state: 'ready', index: 0 });
    const started = [{ ...application, actualStart: iso('09:10') }, developing, basin];
    expect(sittingProgress({ steps: started, status: 'in_progress' }, at('11:30'))).toMatchObject({ state: 'in_progress', index: 0 });
    const between = [{ ...application, actualStart: iso('09:10'), actualEnd: iso('10:12') }, developing, basin];
    expect(sittingProgress({ steps: between, status: 'in_progress' }, at('10:13'))).toMatchObject({ state: 'ready', index: 1 });
  });
  it('finished or a no-show: nothing to tap', () => {
    expect(sittingProgress({ steps, status: 'finished' }, at('10:00'))).toEqual({ state: 'finished' });
    expect(sittingProgress({ steps, status: 'no_show' }, at('10:00'))).toEqual({ state: 'no_show' });
  });
});
