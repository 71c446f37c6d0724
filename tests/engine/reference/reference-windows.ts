/** Brute-force hands-free windows, fits and occupancy, minute by minute. */
import type { Scenario } from '@shared/engine/scenario.schemas';
import { buildCalendar, type MinuteCalendar } from './reference-calendar';

export interface ReferenceWindow {
  stylist: string;
  start: number;
  end: number;
  fits: string[];
}

const inWindow = (cal: MinuteCalendar, si: number, i: number): boolean => cal.developing[si]![i] === 1 && cal.clock[si]![i] === 1 && cal.hands[si]![i] === 0;

function fitsAt(cal: MinuteCalendar, si: number, max: number, from: number, minutes: number): boolean {
  return cal.chairBusy.some((busy) => {
    for (let i = from; i < from + minutes; i++) if (busy[i] || cal.clients[si]![i]! >= max) return false;
    return true;
  });
}

export function referenceWindows(s: Scenario, cal = buildCalendar(s)): ReferenceWindow[] {
  const out: ReferenceWindow[] = [];
  s.stylists.forEach((st, si) => {
    let i = 0;
    while (i < cal.length) {
      if (!inWindow(cal, si, i)) {
        i++;
        continue;
      }
      let j = i;
      while (j < cal.length && inWindow(cal, si, j)) j++;
      const fits = s.fits
        .filter((f) => st.skills.includes(f.skill))
        .filter((f) => {
          for (let t = i; t + f.minutes <= j; t++) if (cal.onGrid[t] && fitsAt(cal, si, st.maxClientsAtOnce, t, f.minutes)) return true;
          return false;
        })
        .map((f) => f.service);
      out.push({ stylist: st.id, start: cal.h0 + i, end: cal.h0 + j, fits: [...new Set(fits)] });
      i = j;
    }
  });
  return out.sort((a, b) => a.start - b.start || (a.stylist < b.stylist ? -1 : 1));
}

export function referenceOccupancy(s: Scenario, cal = buildCalendar(s)) {
  const ratio = (n: number, d: number) => (d === 0 ? null : n / d);
  let open = 0;
  let held = 0;
  for (let i = 0; i < cal.length; i++) {
    if (!cal.salon[i]) continue;
    open++;
    for (const busy of cal.chairBusy) held += busy[i]!;
  }
  const handsOnShare: Record<string, number | null> = {};
  let used = 0;
  let free = 0;
  s.stylists.forEach((st, si) => {
    let onClock = 0;
    let hands = 0;
    for (let i = 0; i < cal.length; i++) {
      if (!cal.clock[si]![i]) continue;
      onClock++;
      if (cal.hands[si]![i]) hands++;
      if (cal.developing[si]![i] && cal.hands[si]![i]) used++;
      if (inWindow(cal, si, i)) free++;
    }
    handsOnShare[st.id] = ratio(hands, onClock);
  });
  return { chairOccupancy: ratio(held, s.chairs.length * open), handsOnShare, windowUse: ratio(used, used + free) };
}
