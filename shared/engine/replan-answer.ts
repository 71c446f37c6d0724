/** What `replanDay` answers. Times are ISO 8601 with offset, like the other answers. */
import type { StepKind } from './compile-request';

export type StepState = 'finished' | 'running' | 'planned';

export interface ReplanStep {
  kind: StepKind;
  /** A finished or running step's actual start; a planned step's new start (on the grid). */
  start: string;
  /** A finished step's actual end; a running step's expected end; a planned step's new end. */
  end: string;
  state: StepState;
  basin?: string;
  /** The ask's own id and label for the step, when it gave them. */
  id?: string;
  label?: string;
}

export interface ReplanSitting {
  booking: string;
  chair: string;
  /** Some step has an actual start. */
  inProgress: boolean;
  /** Some time differs from the booked one. */
  moved: boolean;
  steps: ReplanStep[];
}

/**
 * What a conflict is about: the stylist's `hands` (two hands-on/basin steps at once), `clients` (more clients in
 * chairs than maxClientsAtOnce), a `chair` or `basin` held twice (or out of service), the stylist's working `hours`
 * (time off included), or the salon's `closing` (outside salon hours).
 */
export type ConflictKind = 'hands' | 'clients' | 'chair' | 'basin' | 'hours' | 'closing';

export type ReplanFix =
  /** Shorten (or stretch) a developing step of the re-planned sitting; `steps` is that sitting afterwards. */
  | { kind: 'developing'; booking: string; step: number; id?: string; label?: string; minutes: number; steps: ReplanStep[] }
  | { kind: 'chair'; booking: string; chair: string }
  | { kind: 'basin'; booking: string; step: number; basin: string }
  /** Give the sitting, at its booked times, to another stylist with the skill. */
  | { kind: 'hand_over'; booking: string; stylist: string }
  /** Start the sitting `minutesLate` later (every step moves by as much). */
  | { kind: 'late_start'; booking: string; start: string; minutesLate: number }
  /** Take the sitting off this day; the server searches for the new time. */
  | { kind: 'another_day'; booking: string };

export interface ReplanConflict {
  kind: ConflictKind;
  /** The booking that suffers: the later one; for hours, closing and an out-of-service unit, the re-planned one itself. */
  booking: string;
  /** The re-planned booking that causes it (absent for hours, closing and an out-of-service unit). */
  with?: string;
  /** Minutes of overlap (or outside hours), and the first and last of them. */
  minutes: number;
  start: string;
  end: string;
  /** Feasible fixes, best first. */
  fixes: ReplanFix[];
}

export interface FreedStretch {
  start: string;
  end: string;
  minutes: number;
}

export interface ReplanAnswer {
  stylist: string;
  now: string;
  /** The stylist's sittings that day, by booked start (then id). */
  sittings: ReplanSitting[];
  conflicts: ReplanConflict[];
  /** From now on, minutes the stylist's hands were booked and are free in the re-plan (an early finish). */
  freed: FreedStretch[];
}
