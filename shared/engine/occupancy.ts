/** Chair occupancy, hands-on share and window use over the horizon (one sweep per set). */
import type { OccupancyAnswer } from './answers';
import { intersect, totalLength } from './intervals';
import type { EngineIndex } from './resource-index';
import { handsFreeSpan } from './windows';

const ratio = (num: number, den: number): number | null => (den === 0 ? null : num / den);

export function measure(idx: EngineIndex): OccupancyAnswer {
  const open = totalLength(idx.salon);
  let held = 0;
  for (const chair of idx.chairs) held += totalLength(intersect(chair.busy, idx.salon));

  const handsOnShare: Record<string, number | null> = {};
  let used = 0;
  let free = 0;
  for (const st of idx.stylists) {
    handsOnShare[st.id] = ratio(totalLength(intersect(st.hands, st.clock)), totalLength(st.clock));
    // Steps of one booking never overlap, so developing ∩ hands is always two different clients.
    used += totalLength(intersect(intersect(st.developing, st.hands), st.clock));
    free += totalLength(handsFreeSpan(st));
  }
  return {
    chairOccupancy: ratio(held, idx.chairs.length * open),
    handsOnShare,
    windowUse: ratio(used, used + free),
  };
}
