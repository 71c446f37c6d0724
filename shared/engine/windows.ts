/**
 * Hands-free windows: (their clients' developing time ∩ on the clock) minus their hands time,
 * one sweep per stylist. A fit goes in a window when some grid start leaves its minutes inside
 * the window, with one chair free and the client cap respected throughout.
 */
import { intersect, normalize, subtract, type Span } from './intervals';
import type { EngineIndex, StylistIndex } from './resource-index';
import { ceilGrid } from './sitting-pass';
import { gridOf } from './sitting-day';

export interface RawWindow {
  stylist: number;
  start: number;
  end: number;
  fits: string[];
}

/** Hands-free windows of one stylist (maximal, inside the horizon). */
export function handsFreeSpan(st: StylistIndex): Span {
  return normalize(subtract(intersect(st.developing, st.clock), st.hands));
}

/** For each window, the longest run a fit could use: max over chairs of end − first grid start. */
function longestRuns(idx: EngineIndex, st: StylistIndex, windows: Span): number[] {
  const grid = gridOf(idx);
  const best = new Array<number>(windows.length / 2).fill(0);
  const capped = intersect(windows, st.capFree);
  for (const chair of idx.chairs) {
    const free = chair.free;
    // A two-pointer walk over capped ∩ chair free, without building the intersection.
    let i = 0;
    let j = 0;
    let w = 0;
    // Non-null assertions: spans have even length and the indices stay inside the loop bounds;
    // every piece of capped lies inside some window, so w stops on a window.
    while (i < capped.length && j < free.length) {
      const cs = capped[i]!;
      const ce = capped[i + 1]!;
      const fs = free[j]!;
      const fe = free[j + 1]!;
      const a = cs > fs ? cs : fs;
      const b = ce < fe ? ce : fe;
      if (a < b) {
        while (windows[w + 1]! <= a) w += 2;
        const run = b - ceilGrid(a, grid);
        if (run > best[w / 2]!) best[w / 2] = run;
      }
      if (ce < fe) i += 2;
      else j += 2;
    }
  }
  return best;
}

export function listWindows(idx: EngineIndex, fits: Array<{ service: string; skill: string; minutes: number }>): RawWindow[] {
  const out: RawWindow[] = [];
  idx.stylists.forEach((st, si) => {
    const windows = handsFreeSpan(st);
    if (windows.length === 0) return;
    const mine = fits.filter((f) => st.skills.has(f.skill));
    const runs = mine.length ? longestRuns(idx, st, windows) : [];
    for (let i = 0; i < windows.length; i += 2) {
      const names: string[] = [];
      // runs has one entry per window whenever mine is non-empty.
      for (const f of mine) if (runs[i / 2]! >= f.minutes && !names.includes(f.service)) names.push(f.service);
      out.push({ stylist: si, start: windows[i]!, end: windows[i + 1]!, fits: names });
    }
  });
  const ids = idx.stylists.map((s) => s.id);
  return out.sort((a, b) => a.start - b.start || (ids[a.stylist]! < ids[b.stylist]! ? -1 : 1));
}
