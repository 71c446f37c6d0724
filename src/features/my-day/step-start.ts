import type { DayRunSittingView } from '@shared/schemas/replan.schemas';

/**
 * When step `index` of a sitting now starts: its start in the day as re-planned from the actual times (an overrun
 * earlier in the day pushes it later, an early finish may bring it forward), else the planned one. `planned` is
 * given only when the two differ, to show beside the new time.
 */
export function stepStartNow(plannedStart: string, run: DayRunSittingView | undefined, index: number): { at: string; planned: string | null } {
  const replanned = run?.steps[index]?.start;
  if (!replanned || Date.parse(replanned) === Date.parse(plannedStart)) return { at: plannedStart, planned: null };
  return { at: replanned, planned: plannedStart };
}
