/**
 * The brute-force reference's view of a scenario: one array slot per real minute of the horizon.
 * Deliberately simple and slow; shares nothing with the engine except the rrule date expansion
 * (checked on its own against RFC 5545) and the zod schema for defaults.
 */
import { ruleDays } from '@shared/engine/recurrence';
import { zoneClock } from '@shared/engine/local-time';
import type { HoursRule, Scenario } from '@shared/engine/scenario.schemas';
import { dayToDate, localToUtc, partsOf, utcToLocal, wallToUtc } from './reference-time';

export interface MinuteCalendar {
  zone: string;
  g: number;
  /** UTC minute of the horizon's first minute; index i is minute h0 + i. */
  h0: number;
  length: number;
  salon: Uint8Array;
  /** Local day number and whether the minute is on the local-clock grid. */
  localDay: Int32Array;
  onGrid: Uint8Array;
  clock: Uint8Array[];
  hands: Uint8Array[];
  developing: Uint8Array[];
  clients: Uint8Array[];
  chairBusy: Uint8Array[];
  basinBusy: Uint8Array[];
}

function dayNumber(date: string): number {
  return Date.parse(`${date}T00:00:00Z`) / 86_400_000;
}

function mark(arr: Uint8Array, cal: { h0: number; length: number }, from: number, to: number, value: 1 | -1 | 'add'): void {
  for (let t = Math.max(from, cal.h0); t < Math.min(to, cal.h0 + cal.length); t++) {
    const i = t - cal.h0;
    arr[i] = value === 'add' ? arr[i]! + 1 : value === 1 ? 1 : 0;
  }
}

function markHours(arr: Uint8Array, cal: MinuteCalendar, rules: HoursRule[], s: Scenario): void {
  const from = dayNumber(s.horizon.from);
  const to = dayNumber(s.horizon.to);
  // ruleDays only needs a zone converter for DTSTART/UNTIL values; the hours themselves go through luxon.
  const zc = zoneClock(s.timeZone, from, to);
  for (const rule of rules) {
    for (const day of ruleDays(rule.rrule, from, to, zc)) {
      const date = dayToDate(day);
      const [sh, sm] = rule.start.split(':').map(Number);
      const [eh, em] = rule.end.split(':').map(Number);
      const start = wallToUtc({ ...partsOf(date), hour: sh!, minute: sm! }, s.timeZone).utc;
      const end = wallToUtc({ ...partsOf(date), hour: eh!, minute: em! }, s.timeZone).utc;
      mark(arr, cal, start, end, 1);
    }
  }
}

/** The zone's offset at every minute: sampled every 6 hours, with a bisection where it changes. */
function minuteOffsets(zone: string, h0: number, length: number): Int32Array {
  const at = (i: number) => utcToLocal(h0 + i, zone).offset;
  const out = new Int32Array(length);
  for (let a = 0; a < length; a += 360) {
    const b = Math.min(a + 360, length);
    let lo = a;
    let hi = b;
    const first = at(a);
    if (at(b - 1) !== first) {
      while (hi - lo > 1) {
        const mid = (lo + hi) >> 1;
        if (at(mid) === first) lo = mid;
        else hi = mid;
      }
      out.fill(first, a, hi);
      out.fill(at(hi), hi, b);
    } else {
      out.fill(first, a, b);
    }
  }
  return out;
}

export function buildCalendar(s: Scenario): MinuteCalendar {
  const zone = s.timeZone;
  const h0 = localToUtc(s.horizon.from, zone);
  const length = localToUtc(s.horizon.to, zone) - h0;
  const zeros = () => new Uint8Array(length);
  const cal: MinuteCalendar = {
    zone,
    g: s.granularityMinutes,
    h0,
    length,
    salon: zeros(),
    localDay: new Int32Array(length),
    onGrid: zeros(),
    clock: s.stylists.map(zeros),
    hands: s.stylists.map(zeros),
    developing: s.stylists.map(zeros),
    clients: s.stylists.map(zeros),
    chairBusy: s.chairs.map(zeros),
    basinBusy: s.basins.map(zeros),
  };
  const offsets = minuteOffsets(zone, h0, length);
  for (let i = 0; i < length; i++) {
    const local = h0 + i + offsets[i]!;
    cal.localDay[i] = Math.floor(local / 1440);
    cal.onGrid[i] = local % cal.g === 0 ? 1 : 0;
  }
  markHours(cal.salon, cal, s.salonHours, s);
  s.stylists.forEach((st, si) => {
    markHours(cal.clock[si]!, cal, st.hours, s);
    for (const off of st.timeOff) mark(cal.clock[si]!, cal, localToUtc(off.start, zone), localToUtc(off.end, zone), -1);
  });
  for (const b of s.bookings) {
    const si = s.stylists.findIndex((st) => st.id === b.stylist);
    const ci = s.chairs.findIndex((c) => c.id === b.chair);
    const first = localToUtc(b.steps[0]!.start, zone);
    const last = localToUtc(b.steps[b.steps.length - 1]!.end, zone);
    mark(cal.clients[si]!, cal, first, last, 'add');
    mark(cal.chairBusy[ci]!, cal, first, last, 1);
    for (const step of b.steps) {
      const start = localToUtc(step.start, zone);
      const end = localToUtc(step.end, zone);
      if (step.kind === 'developing') mark(cal.developing[si]!, cal, start, end, 1);
      else mark(cal.hands[si]!, cal, start, end, 1);
      if (step.kind === 'basin') mark(cal.basinBusy[s.basins.findIndex((x) => x.id === step.basin)]!, cal, start, end, 1);
    }
  }
  return cal;
}
