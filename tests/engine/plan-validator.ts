/**
 * Checks one option against every rule of the engine contract, by interval overlap with the
 * scenario's bookings and calendars (luxon for the time zone). Kept apart from the engine so
 * a bug there cannot hide here; returns the list of broken rules (empty when the option is valid).
 */
import { DateTime } from 'luxon';
import type { Option } from '@shared/engine/engine';
import type { HoursRule, Scenario } from '@shared/engine/scenario.schemas';
import { ruleDays } from '@shared/engine/recurrence';
import { zoneClock } from '@shared/engine/local-time';
import { dayToDate, isoToUtc, localToUtc, partsOf, wallToUtc } from './reference/reference-time';

type Range = [number, number];
const overlaps = (a: Range, b: Range): boolean => a[0] < b[1] && b[0] < a[1];
const dayOf = (date: string): number => Date.parse(`${date}T00:00:00Z`) / 86_400_000;

const hoursMemo = new WeakMap<HoursRule[], Map<number, Range[]>>();

/** Hours of one local date as UTC ranges (memoised per rules and date: the day validator asks often). */
function hoursOn(s: Scenario, rules: HoursRule[], day: number): Range[] {
  let days = hoursMemo.get(rules);
  if (!days) hoursMemo.set(rules, (days = new Map()));
  let found = days.get(day);
  if (!found) days.set(day, (found = computeHoursOn(s, rules, day)));
  return found;
}

function computeHoursOn(s: Scenario, rules: HoursRule[], day: number): Range[] {
  const from = dayOf(s.horizon.from);
  const to = dayOf(s.horizon.to);
  const zc = zoneClock(s.timeZone, from, to);
  return rules
    .filter((rule) => ruleDays(rule.rrule, from, to, zc).includes(day))
    .map((rule): Range => {
      const at = (hhmm: string) => {
        const [hour, minute] = hhmm.split(':').map(Number);
        return wallToUtc({ ...partsOf(dayToDate(day)), hour: hour!, minute: minute! }, s.timeZone).utc;
      };
      return [at(rule.start), at(rule.end)];
    });
}

/** Is [a, b) covered by the union of ranges? */
function covered(range: Range, ranges: Range[]): boolean {
  let t = range[0];
  for (const [x, y] of [...ranges].sort((p, q) => p[0] - q[0])) if (x <= t && y > t) t = y;
  return t >= range[1];
}

function localDay(utc: number, zone: string): number {
  const dt = DateTime.fromMillis(utc * 60_000, { zone });
  return Date.UTC(dt.year, dt.month - 1, dt.day) / 86_400_000;
}

export function validateOption(s: Scenario, option: Option): string[] {
  const errors: string[] = [];
  const r = s.request!;
  const zone = s.timeZone;
  const g = s.granularityMinutes;
  const st = s.stylists.find((x) => x.id === option.stylist);
  if (!st) return [`unknown stylist ${option.stylist}`];
  if (!st.skills.includes(r.skill)) errors.push('rule 8: stylist lacks the skill');
  if (r.stylist !== null && r.stylist !== st.id) errors.push('rule 8: not the requested stylist');
  if (option.sittings.length !== r.sittings.length) return [...errors, 'wrong number of sittings'];
  const mine = s.bookings.filter((b) => b.stylist === st.id);
  const span = (b: Scenario['bookings'][number]): Range => [localToUtc(b.steps[0]!.start, zone), localToUtc(b.steps[b.steps.length - 1]!.end, zone)];
  const horizon: Range = [localToUtc(s.horizon.from, zone), localToUtc(s.horizon.to, zone)];
  const earliest = localToUtc(r.earliest, zone);
  let previousDay: number | null = null;

  option.sittings.forEach((sitting, k) => {
    const at = (msg: string) => errors.push(`sitting ${k}: ${msg}`);
    const spec = r.sittings[k]!;
    if (sitting.steps.length !== spec.steps.length) return at('wrong number of steps');
    const times = sitting.steps.map((x): Range => [isoToUtc(x.start), isoToUtc(x.end)]);
    // Printed local time must be the zone's wall clock at that instant (rule 9).
    for (const x of sitting.steps)
      for (const iso of [x.start, x.end]) {
        const shown = DateTime.fromISO(iso, { setZone: true });
        if (shown.offset !== DateTime.fromMillis(shown.toMillis(), { zone }).offset) at(`${iso} has the wrong offset`);
      }
    const whole: Range = [times[0]![0], times[times.length - 1]![1]];
    const day = localDay(whole[0], zone);
    if (DateTime.fromMillis(whole[0] * 60_000, { zone }).minute % g !== 0) at('start is off the grid');
    spec.steps.forEach((want, i) => {
      const got = sitting.steps[i]!;
      const minutes = times[i]![1] - times[i]![0];
      if (got.kind !== want.kind) at(`step ${i} kind ${got.kind}`);
      if (got.id !== want.id || got.label !== want.label) at(`step ${i} does not carry the request's id and label`);
      if (i > 0 && times[i]![0] !== times[i - 1]![1]) at(`rule 1: gap before step ${i}`);
      const [lo, hi] = want.kind === 'developing' ? [want.minMinutes, want.maxMinutes] : [want.minutes, want.minutes];
      if (minutes < lo || minutes > hi || minutes % g !== 0) at(`rule 1/9: step ${i} lasts ${minutes} real minutes`);
    });
    // Rule 2: the chair is not held by anyone else meanwhile.
    if (!s.chairs.some((c) => c.id === sitting.chair)) at(`unknown chair ${sitting.chair}`);
    for (const b of s.bookings) if (b.chair === sitting.chair && overlaps(span(b), whole)) at(`rule 2: chair held by ${b.id}`);
    sitting.steps.forEach((step, i) => {
      if (step.kind === 'developing') return;
      for (const b of mine)
        for (const other of b.steps) {
          const o: Range = [localToUtc(other.start, zone), localToUtc(other.end, zone)];
          // Rule 4: hands_on/basin never overlap the stylist's other hands work.
          if (other.kind !== 'developing' && overlaps(o, times[i]!)) at(`rule 4: hands overlap ${b.id}`);
        }
      if (step.kind === 'basin') {
        // Rule 3: one client per basin, whoever their stylist is.
        if (!s.basins.some((x) => x.id === step.basin)) at(`rule 3: unknown basin ${step.basin}`);
        for (const b of s.bookings)
          for (const other of b.steps) {
            if (other.kind === 'basin' && other.basin === step.basin && overlaps([localToUtc(other.start, zone), localToUtc(other.end, zone)], times[i]!))
              at(`rule 3: basin used by ${b.id}`);
          }
      }
    });
    // Rule 5: the most clients at once happens at the sitting's start or at another client's arrival.
    const spans = mine.map(span).filter((x) => overlaps(x, whole));
    for (const t of [whole[0], ...spans.map((x) => x[0]).filter((t) => t > whole[0] && t < whole[1])]) {
      if (spans.filter((x) => x[0] <= t && t < x[1]).length + 1 > st.maxClientsAtOnce) at('rule 5: too many clients at once');
    }
    // Rule 6: inside that day's working hours and salon hours, no time off, after earliest, in the horizon.
    if (localDay(whole[1] - 1, zone) !== day) at('rule 6: crosses local midnight');
    if (!covered(whole, hoursOn(s, st.hours, day))) at('rule 6: outside working hours');
    if (!covered(whole, hoursOn(s, s.salonHours, day))) at('rule 6: outside salon hours');
    for (const off of st.timeOff) if (overlaps([localToUtc(off.start, zone), localToUtc(off.end, zone)], whole)) at('rule 6: time off');
    if (whole[0] < earliest) at('rule 6: before earliest');
    const allowed = spec.allowedStarts;
    if (allowed && !allowed.some((w) => localToUtc(w.from, zone) <= whole[0] && whole[0] <= localToUtc(w.to, zone))) at('starts outside its allowed starts');
    if (whole[0] < horizon[0] || whole[1] > horizon[1]) at('rule 6: outside the horizon');
    // Rule 7: local-date distance from the previous sitting.
    if (previousDay !== null) {
      const gap = spec.daysAfterPrevious!;
      if (day - previousDay < gap.min || day - previousDay > gap.max) at(`rule 7: ${day - previousDay} days after previous`);
    }
    previousDay = day;
  });
  return errors;
}

/** A sitting of a day as the day validator reads it: UTC minutes, and which steps are history already. */
export interface DaySittingCheck {
  id: string;
  stylist: string;
  chair: string;
  /** Booked start, for naming the later of two changed sittings. */
  bookedStart: number;
  steps: Array<{ kind: string; start: number; end: number; basin?: string; finished: boolean }>;
}

export interface DayViolation {
  kind: 'hands' | 'clients' | 'chair' | 'basin' | 'hours' | 'closing';
  booking: string;
  with?: string;
  minutes: number;
}

/** A scenario booking as the day validator reads it (nothing finished). */
export function bookedForCheck(s: Scenario, b: Scenario['bookings'][number]): DaySittingCheck {
  const steps = b.steps.map((x) => ({
    kind: x.kind,
    start: localToUtc(x.start, s.timeZone),
    end: localToUtc(x.end, s.timeZone),
    basin: x.kind === 'basin' ? x.basin : undefined,
    finished: false,
  }));
  return { id: b.id, stylist: b.stylist, chair: b.chair, bookedStart: steps[0]!.start, steps };
}

/**
 * The contract's placement rules broken by the `subjects` among a day's sittings, minute by minute: rule 4 (hands),
 * 5 (clients at once), 2 (chair), 3 (basin) against every other sitting, and 6 (working hours, time off, salon hours,
 * units out of service). Minutes where both sides are finished are history and not counted. Written apart from
 * the engine's interval code, so a shared mistake is unlikely.
 */
export function validateDay(s: Scenario, sittings: DaySittingCheck[], subjects: ReadonlySet<string>): DayViolation[] {
  const zone = s.timeZone;
  const out = new Map<string, DayViolation>();
  const count = (kind: DayViolation['kind'], booking: string, other: string | undefined, minutes: number) => {
    if (minutes === 0) return;
    const key = `${kind}|${booking}|${other ?? ''}`;
    const v = out.get(key) ?? { kind, booking, ...(other ? { with: other } : {}), minutes: 0 };
    v.minutes += minutes;
    out.set(key, v);
  };
  const period = (p: { start: string; end: string }): Range => [localToUtc(p.start, zone), localToUtc(p.end, zone)];
  const within = (t: number, ranges: Range[]) => ranges.some(([a, b]) => a <= t && t < b);
  const span = (x: DaySittingCheck): Range => [x.steps[0]!.start, x.steps[x.steps.length - 1]!.end];
  const live = (x: DaySittingCheck) => x.steps.some((step) => !step.finished);
  const stepAt = (x: DaySittingCheck, t: number) => x.steps.find((step) => step.start <= t && t < step.end);
  const daysOf = (r: Range) => [...new Set([localDay(r[0], zone) - 1, localDay(r[0], zone), localDay(r[1] - 1, zone)])];
  const byStylist = (id: string) => s.stylists.find((x) => x.id === id)!;
  // Clients of a stylist in chairs at each minute, counted once per call.
  const present = new Map<string, Map<number, number>>();
  const presentAt = (stylist: string, t: number) => {
    let counts = present.get(stylist);
    if (!counts) {
      counts = new Map();
      for (const y of sittings.filter((z) => z.stylist === stylist)) for (let m = span(y)[0]; m < span(y)[1]; m++) counts.set(m, (counts.get(m) ?? 0) + 1);
      present.set(stylist, counts);
    }
    return counts.get(t) ?? 0;
  };

  for (const c of sittings.filter((x) => subjects.has(x.id))) {
    const [a, b] = span(c);
    const st = byStylist(c.stylist);
    if (live(c)) {
      const hours = daysOf([a, b]).flatMap((d) => hoursOn(s, st.hours, d));
      const salon = daysOf([a, b]).flatMap((d) => hoursOn(s, s.salonHours, d));
      const off = st.timeOff.map(period);
      const chairOut = (s.chairs.find((x) => x.id === c.chair)?.outOfService ?? []).map(period);
      for (let t = a; t < b; t++) {
        if (!within(t, hours) || within(t, off)) count('hours', c.id, undefined, 1);
        if (!within(t, salon)) count('closing', c.id, undefined, 1);
        if (within(t, chairOut)) count('chair', c.id, undefined, 1);
        const step = stepAt(c, t);
        const basinOut = step?.basin ? (s.basins.find((x) => x.id === step.basin)?.outOfService ?? []).map(period) : [];
        if (step && !step.finished && within(t, basinOut)) count('basin', c.id, undefined, 1);
      }
    }
    for (const x of sittings) {
      if (x.id === c.id || (subjects.has(x.id) && sittings.indexOf(x) < sittings.indexOf(c))) continue;
      if (!live(c) && !live(x)) continue;
      const xLater = x.bookedStart > c.bookedStart || (x.bookedStart === c.bookedStart && x.id > c.id);
      const [named, other] = !subjects.has(x.id) || xLater ? [x.id, c.id] : [c.id, x.id];
      const [xa, xb] = span(x);
      if (xa >= b || a >= xb) continue;
      for (let t = Math.min(a, xa); t < Math.max(b, xb); t++) {
        const p = stepAt(c, t);
        const q = stepAt(x, t);
        const inBoth = t >= a && t < b && t >= xa && t < xb;
        const eitherLive = p && q && (!p.finished || !q.finished);
        if (x.stylist === c.stylist) {
          if (eitherLive && p.kind !== 'developing' && q.kind !== 'developing') count('hands', named, other, 1);
          if (inBoth && presentAt(c.stylist, t) > st.maxClientsAtOnce) count('clients', named, other, 1);
        }
        if (inBoth && x.chair === c.chair) count('chair', named, other, 1);
        if (eitherLive && p.basin && p.basin === q.basin) count('basin', named, other, 1);
      }
    }
  }
  return [...out.values()];
}
