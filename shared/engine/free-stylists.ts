/**
 * Which stylists could take over booked sittings exactly as they stand (same chair, same times):
 * they have the skill, are on the clock inside salon hours for each sitting's whole span, their hands
 * are free for its hands-on and basin steps, and one more client stays within their cap.
 */
import { instant } from './compile-context';
import { findContaining, type Span } from './intervals';
import type { EngineIndex } from './resource-index';
import type { Booking } from './scenario.schemas';

const covers = (set: Span, start: number, end: number): boolean => {
  const i = findContaining(set, start);
  return i >= 0 && set[i + 1]! >= end;
};

/** `sittings` must not be among the scenario's bookings (leave the booking out when loading it). */
export function freeStylists(idx: EngineIndex, skill: string, sittings: Booking[]): string[] {
  const times = sittings.map((sitting, i) =>
    sitting.steps.map((step, k) => ({
      hands: step.kind !== 'developing',
      start: instant(idx.ctx, step.start, `sittings[${i}].steps[${k}].start`),
      end: instant(idx.ctx, step.end, `sittings[${i}].steps[${k}].end`),
    })),
  );
  return idx.stylists
    .filter((st) => st.skills.has(skill))
    .filter((st) =>
      times.every((steps) => {
        // The booking schema requires at least one step per sitting.
        const first = steps[0]!.start;
        const last = steps[steps.length - 1]!.end;
        return covers(st.avail, first, last) && covers(st.capFree, first, last) && steps.every((s) => !s.hands || covers(st.handsFree, s.start, s.end));
      }),
    )
    .map((st) => st.id);
}
