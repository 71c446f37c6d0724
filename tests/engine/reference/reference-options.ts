/**
 * Brute-force options: try every grid minute of the horizon as a start, every chair, every
 * developing length and every basin, checking each minute of each step against the minute
 * calendar. Returns the K earliest feasible (stylist, start) pairs per the contract.
 */
import type { RequestStep, Scenario } from '@shared/engine/scenario.schemas';
import { localToUtc } from './reference-time';
import { buildCalendar, type MinuteCalendar } from './reference-calendar';

export interface ReferencePair {
  stylist: string;
  /** UTC minute of the first sitting's start. */
  start: number;
}

interface Ctx {
  cal: MinuteCalendar;
  s: Scenario;
  si: number;
  earliest: number;
  max: number;
}

/** Is minute i usable for this sitting step (without the basin)? */
function minuteOk(c: Ctx, i: number, day: number, chair: number, hands: boolean): boolean {
  const { cal, si } = c;
  if (i < 0 || i >= cal.length || cal.h0 + i < c.earliest) return false;
  if (cal.localDay[i] !== day || !cal.salon[i] || !cal.clock[si]![i]) return false;
  if (cal.chairBusy[chair]![i] || cal.clients[si]![i]! >= c.max) return false;
  return !(hands && cal.hands[si]![i]);
}

function stepFits(c: Ctx, from: number, minutes: number, day: number, chair: number, kind: RequestStep['kind']): boolean {
  for (let i = from; i < from + minutes; i++) if (!minuteOk(c, i, day, chair, kind !== 'developing')) return false;
  if (kind !== 'basin') return true;
  return c.cal.basinBusy.some((busy) => {
    for (let i = from; i < from + minutes; i++) if (busy[i]) return false;
    return true;
  });
}

function chainFits(c: Ctx, steps: RequestStep[], k: number, at: number, day: number, chair: number): boolean {
  if (k === steps.length) return true;
  const step = steps[k]!;
  const [lo, hi] = step.kind === 'developing' ? [step.minMinutes, step.maxMinutes] : [step.minutes, step.minutes];
  for (let d = lo; d <= hi; d += c.cal.g) {
    if (stepFits(c, at, d, day, chair, step.kind) && chainFits(c, steps, k + 1, at + d, day, chair)) return true;
  }
  return false;
}

function sittingFits(c: Ctx, sitting: number, start: number): boolean {
  const { steps, allowedStarts } = c.s.request!.sittings[sitting]!;
  const at = c.cal.h0 + start;
  if (allowedStarts && !allowedStarts.some((w) => localToUtc(w.from, c.s.timeZone) <= at && at <= localToUtc(w.to, c.s.timeZone))) return false;
  const day = c.cal.localDay[start]!;
  return c.s.chairs.some((_, chair) => chainFits(c, steps, 0, start, day, chair));
}

/** All feasible first-sitting pairs, in contract order (start, then stylist id). */
export function referencePairs(s: Scenario): Array<ReferencePair & { day: number }> {
  const r = s.request!;
  const cal = buildCalendar(s);
  const earliest = localToUtc(r.earliest, s.timeZone);
  const pairs: Array<ReferencePair & { day: number }> = [];
  s.stylists.forEach((st, si) => {
    if (!st.skills.includes(r.skill) || (r.stylist !== null && r.stylist !== st.id)) return;
    const c: Ctx = { cal, s, si, earliest, max: st.maxClientsAtOnce };
    const dayOk = new Map<string, boolean>();
    // Does sitting k fit on local day `day` (at some grid start), with all later sittings after it?
    const fitsFrom = (k: number, day: number): boolean => {
      const key = `${k}:${day}`;
      if (!dayOk.has(key)) {
        let ok = false;
        for (let i = 0; i < cal.length && !ok; i++) {
          if (cal.localDay[i] === day && cal.onGrid[i] && sittingFits(c, k, i)) ok = laterFit(k, day);
        }
        dayOk.set(key, ok);
      }
      return dayOk.get(key)!;
    };
    const laterFit = (k: number, day: number): boolean => {
      if (k + 1 === r.sittings.length) return true;
      const gap = r.sittings[k + 1]!.daysAfterPrevious!;
      for (let d = day + gap.min; d <= day + gap.max; d++) if (fitsFrom(k + 1, d)) return true;
      return false;
    };
    for (let i = 0; i < cal.length; i++) {
      if (!cal.onGrid[i] || !sittingFits(c, 0, i) || !laterFit(0, cal.localDay[i]!)) continue;
      pairs.push({ stylist: st.id, start: cal.h0 + i, day: cal.localDay[i]! });
    }
  });
  return pairs.sort((a, b) => a.start - b.start || (a.stylist < b.stylist ? -1 : a.stylist > b.stylist ? 1 : 0));
}

/** The contract's answer: K earliest pairs, with "day" keeping the first per stylist and date. */
export function referenceOptions(s: Scenario): ReferencePair[] {
  const r = s.request!;
  const seen = new Set<string>();
  const out: ReferencePair[] = [];
  for (const p of referencePairs(s)) {
    const key = `${p.stylist}:${p.day}`;
    if (r.spread === 'day' && seen.has(key)) continue;
    seen.add(key);
    out.push({ stylist: p.stylist, start: p.start });
    if (out.length === r.limit) break;
  }
  return out;
}
