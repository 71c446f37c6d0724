/**
 * Re-planning one stylist's day from the actual times: the day as it now runs, the conflicts it creates with the
 * bookings kept where they are, feasible fixes for each, and the hands minutes an early finish frees.
 */
import { dayConflicts } from './day-conflicts';
import { intersect, normalize, subtract, type Span } from './intervals';
import type { FreedStretch, ReplanAnswer, ReplanFix, ReplanSitting, ReplanStep } from './replan-answer';
import { readDay, type DayStep, type DaySitting, type ReplanDay } from './replan-day';
import { FixFinder, type DayFix } from './replan-fixes';
import type { Scenario } from './scenario.schemas';

export function replan(scenario: Scenario, askInput: unknown): ReplanAnswer {
  const day = readDay(scenario, askInput);
  const fmt = day.cal.ctx.clock.format;
  const subjects = new Set(day.sittings.filter((x) => x.inProgress).map((x) => x.id));
  const finder = new FixFinder(scenario, day, subjects);
  const step = (x: DayStep): ReplanStep => {
    const out: ReplanStep = { kind: x.kind, start: fmt(x.start), end: fmt(x.end), state: x.state };
    if (x.basin !== undefined) out.basin = x.basin;
    if (x.id !== undefined) out.id = x.id;
    if (x.label !== undefined) out.label = x.label;
    return out;
  };
  const fix = (f: DayFix): ReplanFix => {
    if (f.kind === 'late_start') return { ...f, start: fmt(f.start) };
    if (f.kind !== 'developing') return f;
    const tags = f.sitting.steps[f.step]!;
    return {
      kind: 'developing',
      booking: f.booking,
      step: f.step,
      ...(tags.id !== undefined ? { id: tags.id } : {}),
      ...(tags.label !== undefined ? { label: tags.label } : {}),
      minutes: f.minutes,
      steps: f.sitting.steps.map(step),
    };
  };
  const mine = day.sittings
    .filter((x) => x.stylist === day.ask.stylist && x.bookedTimes[0]! < day.day[1] && x.bookedTimes[x.bookedTimes.length - 1]! > day.day[0])
    .sort((a, b) => a.bookedTimes[0]! - b.bookedTimes[0]! || (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
  return {
    stylist: day.ask.stylist,
    now: fmt(day.now),
    sittings: mine.map((x): ReplanSitting => ({ booking: x.id, chair: x.chair, inProgress: x.inProgress, moved: moved(x), steps: x.steps.map(step) })),
    conflicts: dayConflicts(day.cal, day.sittings, subjects).map((c) => ({
      ...c,
      start: fmt(c.start),
      end: fmt(c.end),
      fixes: finder.fixesFor(c).map(fix),
    })),
    freed: freed(day, mine).map((x): FreedStretch => ({ start: fmt(x[0]), end: fmt(x[1]), minutes: x[1] - x[0] })),
  };
}

const moved = (x: DaySitting): boolean => x.steps.some((step, k) => step.start !== x.bookedTimes[2 * k] || step.end !== x.bookedTimes[2 * k + 1]);

/** Hands minutes of the in-progress sittings as booked that nothing of the stylist's holds now, from now on, on the clock. */
function freed(day: ReplanDay, mine: DaySitting[]): Array<[number, number]> {
  const handsOf = (x: DaySitting, times: number[]) => x.steps.flatMap((step, k) => (step.kind === 'developing' ? [] : [times[2 * k]!, times[2 * k + 1]!]));
  const booked = normalize(mine.filter((x) => x.inProgress).flatMap((x) => handsOf(x, x.bookedTimes)));
  const now = normalize(
    mine.flatMap((x) =>
      handsOf(
        x,
        x.steps.flatMap((step) => [step.start, step.end]),
      ),
    ),
  );
  const left: Span = intersect(intersect(subtract(booked, now), [day.now, Infinity]), day.cal.clock.get(day.ask.stylist) ?? []);
  const out: Array<[number, number]> = [];
  for (let i = 0; i < left.length; i += 2) out.push([left[i]!, left[i + 1]!]);
  return out;
}
