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

/** Hours of one local date as UTC ranges. */
function hoursOn(s: Scenario, rules: HoursRule[], day: number): Range[] {
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
