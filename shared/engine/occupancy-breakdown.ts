/**
 * The minutes behind the occupancy answer, cut into parts (e.g. weeks) and into local hour-of-day ×
 * weekday cells, from the same index and the same definitions as occupancy.ts. Summing minutes and
 * dividing once gives the answer again, so parts and cells always add up to the headline figures.
 */
import { clip, intersect, totalLength, type Span } from './intervals';
import type { EngineIndex } from './resource-index';
import { handsFreeSpan } from './windows';

/** Numerators and denominators of chair occupancy, hands-on share and window use. */
export interface OccupancyMinutes {
  /** Chair-minutes holding a client inside salon hours. */
  chairHeld: number;
  /** Number of chairs × salon-open minutes. */
  chairOpen: number;
  /** Per stylist: hands_on + basin minutes on the clock, and minutes on the clock. */
  stylists: Record<string, { handsOn: number; onClock: number }>;
  /** Minutes a stylist works hands-on for one client while another develops (on the clock). */
  windowUsed: number;
  /** Hands-free window minutes left unused. */
  windowFree: number;
}

/** Chair minutes of one local hour of one weekday, summed over the horizon. */
export interface HourCell {
  /** ISO weekday: 1 = Monday … 7 = Sunday. */
  weekday: number;
  /** Local hour of day, 0–23. */
  hour: number;
  chairHeld: number;
  chairOpen: number;
}

interface Prepared {
  salon: Span;
  chairs: number;
  held: Span[];
  stylists: Array<{ id: string; clock: Span; handsOn: Span; used: Span; free: Span }>;
}

function prepare(idx: EngineIndex): Prepared {
  return {
    salon: idx.salon,
    chairs: idx.chairs.length,
    held: idx.chairs.map((c) => intersect(c.busy, idx.salon)),
    stylists: idx.stylists.map((st) => ({
      id: st.id,
      clock: st.clock,
      handsOn: intersect(st.hands, st.clock),
      used: intersect(intersect(st.developing, st.hands), st.clock),
      free: handsFreeSpan(st),
    })),
  };
}

const within = (a: Span, lo: number, hi: number) => totalLength(clip(a, lo, hi));

function minutesWithin(p: Prepared, lo: number, hi: number): OccupancyMinutes {
  let chairHeld = 0;
  for (const h of p.held) chairHeld += within(h, lo, hi);
  const stylists: OccupancyMinutes['stylists'] = {};
  let windowUsed = 0;
  let windowFree = 0;
  for (const st of p.stylists) {
    stylists[st.id] = { handsOn: within(st.handsOn, lo, hi), onClock: within(st.clock, lo, hi) };
    windowUsed += within(st.used, lo, hi);
    windowFree += within(st.free, lo, hi);
  }
  return { chairHeld, chairOpen: p.chairs * within(p.salon, lo, hi), stylists, windowUsed, windowFree };
}

/**
 * Minutes over the whole horizon, over each [cuts[i], cuts[i+1]) (UTC minutes), and per local
 * weekday × hour. A local hour is [that wall-clock hour, the next) in real minutes: on a
 * spring-forward day the skipped hour is empty, on a fall-back day the repeated hour counts twice as long.
 */
export function breakDown(idx: EngineIndex, cuts: number[]): { total: OccupancyMinutes; parts: OccupancyMinutes[]; cells: HourCell[] } {
  const p = prepare(idx);
  const { ctx } = idx;
  const parts: OccupancyMinutes[] = [];
  for (let i = 0; i + 1 < cuts.length; i++) parts.push(minutesWithin(p, cuts[i]!, cuts[i + 1]!));
  const cells = new Map<number, HourCell>();
  for (let day = ctx.fromDay; day < ctx.toDay; day++) {
    // 1970-01-01 (day 0) was a Thursday, ISO weekday 4.
    const weekday = ((((day + 3) % 7) + 7) % 7) + 1;
    for (let hour = 0; hour < 24; hour++) {
      const lo = ctx.clock.toUtc(day * 1440 + hour * 60, 'shift') as number;
      const hi = ctx.clock.toUtc(day * 1440 + hour * 60 + 60, 'shift') as number;
      const open = p.chairs * within(p.salon, lo, hi);
      if (open === 0) continue;
      let held = 0;
      for (const h of p.held) held += within(h, lo, hi);
      const key = weekday * 24 + hour;
      const cell = cells.get(key) ?? { weekday, hour, chairHeld: 0, chairOpen: 0 };
      cell.chairHeld += held;
      cell.chairOpen += open;
      cells.set(key, cell);
    }
  }
  return {
    total: minutesWithin(p, ctx.start, ctx.end),
    parts,
    cells: [...cells.values()].sort((a, b) => a.weekday - b.weekday || a.hour - b.hour),
  };
}
