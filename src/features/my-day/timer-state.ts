import { DateTime } from 'luxon';
import type { SittingView } from '@shared/schemas/booking-view.schemas';

type Step = SittingView['steps'][number];

/**
 * Where a developing step stands: still to start, processing, past its least
 * time (it can be checked), or past its most time (it must come off now).
 */
export type DevelopingPhase = 'not_started' | 'processing' | 'can_check' | 'must_come_off';

export type TimerState = {
  phase: DevelopingPhase;
  /** Whole minutes to the planned end (0 once it has passed). */
  minutesLeft: number;
  /** Minutes since the step started (0 before it starts). */
  minutesIn: number;
};

const minutesFrom = (fromIso: string, now: DateTime) => now.diff(DateTime.fromISO(fromIso), 'minutes').minutes;

/** The timer of a developing step at `now`; steps without a min or max use their planned length for both. */
export function developingTimer(step: Pick<Step, 'start' | 'end' | 'minMinutes' | 'maxMinutes'>, now: DateTime): TimerState {
  const planned = Math.round(DateTime.fromISO(step.end).diff(DateTime.fromISO(step.start), 'minutes').minutes);
  const least = step.minMinutes ?? planned;
  const most = step.maxMinutes ?? planned;
  const minutesIn = minutesFrom(step.start, now);
  const minutesLeft = Math.max(0, Math.ceil(-minutesFrom(step.end, now)));
  if (minutesIn < 0) return { phase: 'not_started', minutesLeft: planned, minutesIn: 0 };
  const whole = Math.floor(minutesIn);
  if (minutesIn >= most) return { phase: 'must_come_off', minutesLeft, minutesIn: whole };
  if (minutesIn >= least) return { phase: 'can_check', minutesLeft, minutesIn: whole };
  return { phase: 'processing', minutesLeft, minutesIn: whole };
}

export type SittingProgress =
  { state: 'upcoming'; next: Step } | { state: 'in_progress'; step: Step; index: number; next: Step | null } | { state: 'finished' };

/** Which step of a sitting is under way at `now` (a developing step stays "in progress" until the next step starts). */
export function sittingProgress(sitting: Pick<SittingView, 'steps'>, now: DateTime): SittingProgress {
  const steps = sitting.steps;
  const first = steps[0];
  if (!first) return { state: 'finished' };
  if (now < DateTime.fromISO(first.start)) return { state: 'upcoming', next: first };
  const index = steps.findIndex((s) => now >= DateTime.fromISO(s.start) && now < DateTime.fromISO(s.end));
  const step = steps[index];
  if (step) return { state: 'in_progress', step, index, next: steps[index + 1] ?? null };
  return { state: 'finished' };
}
