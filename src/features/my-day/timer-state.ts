import { DateTime } from 'luxon';
import type { SittingView } from '@shared/schemas/booking-view.schemas';

type Step = SittingView['steps'][number];
type TimedStep = Pick<Step, 'kind' | 'start' | 'end' | 'minMinutes' | 'maxMinutes'> &
  Partial<Pick<Step, 'product' | 'limitMinutes' | 'actualStart' | 'actualEnd'>>;

/**
 * Where a developing step stands: still to start, processing, past its least time (it can be checked), past its
 * most time (it must come off now), or past the product family's processing limit (over time: rinse now).
 */
export type DevelopingPhase = 'not_started' | 'processing' | 'can_check' | 'must_come_off' | 'over_limit';

/** When a developing step's clock runs from, and the times it is measured against. */
export type DevelopingTiming = {
  /** When processing began: the end of the application, the tap that started the step, or its planned start. */
  from: DateTime;
  /** True when `from` is a real moment someone tapped, false while only the plan is known. */
  fromActual: boolean;
  planned: number;
  least: number;
  most: number;
  /** When the product first went on (the family's limit counts from then) and that limit; null when not limited. */
  productOn: DateTime;
  limit: number | null;
};

export type TimerState = {
  phase: DevelopingPhase;
  /** Whole minutes to the end of the planned length, counted from `from` (0 once it has passed). */
  minutesLeft: number;
  /** Whole minutes since processing began (0 before it begins). */
  minutesIn: number;
  /** Whole minutes the product has been on the hair (from its first application). */
  minutesOnHair: number;
};

const at = (iso: string) => DateTime.fromISO(iso);
const minutesBetween = (from: DateTime, to: DateTime) => to.diff(from, 'minutes').minutes;

/**
 * The clock of developing step `index` of a sitting. It runs from the real moment product went on when one is known:
 * the actual end of the application just before it (a hands-on step with the same product), else the tap that started
 * the step, else its planned start. The family's limit counts from when that product first went on since the last
 * rinse (the start of its application), as the processing limits do (shared/rules/processing-limits.ts).
 */
export function developingTiming(steps: readonly TimedStep[], index: number): DevelopingTiming {
  const step = steps[index];
  if (!step) throw new RangeError(`No step ${index} in this sitting`);
  const planned = Math.round(minutesBetween(at(step.start), at(step.end)));
  const before = steps[index - 1];
  const application = before && before.kind === 'hands_on' && before.product === step.product ? before : undefined;
  const real = application?.actualEnd ?? step.actualStart ?? null;
  // The first step since the last rinse that put this product on (this step itself when none did).
  let firstOn = step;
  for (let i = index - 1; i >= 0; i--) {
    const earlier = steps[i];
    if (!earlier || earlier.kind === 'basin' || earlier.product !== step.product) break;
    firstOn = earlier;
  }
  return {
    from: at(real ?? step.start),
    fromActual: real !== null,
    planned,
    least: step.minMinutes ?? planned,
    most: step.maxMinutes ?? planned,
    productOn: at(firstOn.actualStart ?? firstOn.start),
    limit: step.limitMinutes ?? null,
  };
}

/** The timer at `now`. Over the family's limit wins over everything: the product must come off, whatever the plan. */
export function developingTimer(timing: DevelopingTiming, now: DateTime): TimerState {
  // A tapped moment a little ahead of `now` (the screen's clock ticks every few seconds, devices' clocks differ)
  // has still begun: only the plan's start can lie ahead.
  const minutesIn = timing.fromActual ? Math.max(0, minutesBetween(timing.from, now)) : minutesBetween(timing.from, now);
  const onHair = Math.max(0, Math.floor(minutesBetween(timing.productOn, now)));
  const minutesLeft = Math.max(0, Math.ceil(timing.planned - minutesIn));
  if (minutesIn < 0) return { phase: 'not_started', minutesLeft: timing.planned, minutesIn: 0, minutesOnHair: onHair };
  const state = { minutesLeft, minutesIn: Math.floor(minutesIn), minutesOnHair: onHair };
  if (timing.limit !== null && minutesBetween(timing.productOn, now) >= timing.limit) return { phase: 'over_limit', ...state };
  if (minutesIn >= timing.most) return { phase: 'must_come_off', ...state };
  if (minutesIn >= timing.least) return { phase: 'can_check', ...state };
  return { phase: 'processing', ...state };
}

/** The moments a developing step raises an alert: least time reached, 5 minutes before the most time, the limit. */
export type TimerAlert = { kind: 'least' | 'most_soon' | 'limit'; at: DateTime };

/** Minutes before the most time that the second alert comes (the rule for the stylist and the desk). */
export const MOST_SOON_MINUTES = 5;

export function timerAlerts(timing: DevelopingTiming): TimerAlert[] {
  const alerts: TimerAlert[] = [
    { kind: 'least', at: timing.from.plus({ minutes: timing.least }) },
    { kind: 'most_soon', at: timing.from.plus({ minutes: Math.max(0, timing.most - MOST_SOON_MINUTES) }) },
  ];
  if (timing.limit !== null) alerts.push({ kind: 'limit', at: timing.productOn.plus({ minutes: timing.limit }) });
  return alerts;
}

/** The alerts whose moment has come by `now` (each is raised once by the screen that shows the timer). */
export const dueAlerts = (timing: DevelopingTiming, now: DateTime): TimerAlert[] => timerAlerts(timing).filter((a) => a.at <= now);

export type SittingProgress =
  | { state: 'upcoming'; next: Step }
  | { state: 'ready'; next: Step; index: number }
  | { state: 'in_progress'; step: Step; index: number; next: Step | null }
  | { state: 'finished' }
  | { state: 'no_show' };

/**
 * Which step of a sitting is under way. Once the client has arrived the taps decide: the step started and not
 * finished, or the next to start. Before that (booked) the plan's clock shows where the sitting would be; a
 * developing step stays "in progress" until the next step starts.
 */
export function sittingProgress(sitting: Pick<SittingView, 'steps'> & Partial<Pick<SittingView, 'status'>>, now: DateTime): SittingProgress {
  const steps = sitting.steps;
  if (sitting.status === 'finished') return { state: 'finished' };
  if (sitting.status === 'no_show') return { state: 'no_show' };
  if (sitting.status === 'arrived' || sitting.status === 'in_progress') {
    const running = steps.findIndex((s) => s.actualStart && !s.actualEnd);
    const runningStep = steps[running];
    if (runningStep) return { state: 'in_progress', step: runningStep, index: running, next: steps[running + 1] ?? null };
    const index = steps.findIndex((s) => !s.actualStart);
    const nextStep = steps[index];
    return nextStep ? { state: 'ready', next: nextStep, index } : { state: 'finished' };
  }
  const first = steps[0];
  if (!first) return { state: 'finished' };
  if (now < at(first.start)) return { state: 'upcoming', next: first };
  const index = steps.findIndex((s) => now >= at(s.start) && now < at(s.end));
  const step = steps[index];
  if (step) return { state: 'in_progress', step, index, next: steps[index + 1] ?? null };
  return { state: 'finished' };
}
