/**
 * Fixes for one conflict of a re-planned day, best first. Each candidate is applied to the day and the placement
 * rules run again (day-conflicts.ts): it is offered only when this conflict is gone and no conflict is new or longer.
 * The order is the salon's least disruption first: the running client's developing time, then another chair or
 * basin, another stylist, a late start within the salon's limit, and last another day.
 */
import { buildIndex, type EngineIndex } from './resource-index';
import { conflictKey, dayConflicts, type DayConflict } from './day-conflicts';
import { freeStylists } from './free-stylists';
import { chainSteps, type DaySitting, type ReplanDay } from './replan-day';
import type { Scenario } from './scenario.schemas';
import { ceilGrid, floorGrid } from './sitting-pass';

export type DayFix =
  | { kind: 'developing'; booking: string; step: number; minutes: number; sitting: DaySitting }
  | { kind: 'chair'; booking: string; chair: string }
  | { kind: 'basin'; booking: string; step: number; basin: string }
  | { kind: 'hand_over'; booking: string; stylist: string }
  | { kind: 'late_start'; booking: string; start: number; minutesLate: number }
  | { kind: 'another_day'; booking: string };

/** The day with one sitting replaced (or, for another day, left out). */
function applied(sittings: DaySitting[], fix: DayFix): DaySitting[] {
  if (fix.kind === 'another_day') return sittings.filter((x) => x.id !== fix.booking);
  return sittings.map((x) => (x.id === fix.booking ? changed(x, fix) : x));
}

function changed(x: DaySitting, fix: DayFix): DaySitting {
  switch (fix.kind) {
    case 'developing':
      return fix.sitting;
    case 'chair':
      return { ...x, chair: fix.chair };
    case 'basin':
      return { ...x, steps: x.steps.map((step, k) => (k === fix.step ? { ...step, basin: fix.basin } : step)) };
    case 'hand_over':
      return { ...x, stylist: fix.stylist };
    case 'late_start':
      return { ...x, steps: x.steps.map((step) => ({ ...step, start: step.start + fix.minutesLate, end: step.end + fix.minutesLate })) };
    default:
      return x;
  }
}

export class FixFinder {
  private readonly baseline = new Map<string, Map<string, DayConflict>>();
  private readonly nowOnGrid: number;
  private index: EngineIndex | undefined;

  constructor(
    private readonly scenario: Scenario,
    private readonly day: ReplanDay,
    private readonly subjects: ReadonlySet<string>,
  ) {
    this.nowOnGrid = ceilGrid(day.now, day.cal.grid);
  }

  /** Feasible fixes for the conflict, best first. */
  fixesFor(c: DayConflict): DayFix[] {
    const byId = new Map(this.day.sittings.map((x) => [x.id, x]));
    const sides = [c.booking, ...(c.with !== undefined ? [c.with] : [])].map((id) => byId.get(id)!);
    const waiting = sides.filter((x) => !x.inProgress);
    // Per group: the first feasible candidate for each sitting, except that every free stylist is offered.
    const groups: Array<{ fixes: DayFix[]; every?: true }> = [
      { fixes: sides.filter((x) => x.inProgress).flatMap((x) => this.developing(x)) },
      { fixes: c.kind === 'chair' ? waiting.flatMap((x) => this.chairs(x)) : [] },
      { fixes: c.kind === 'basin' ? sides.flatMap((x) => this.basins(x)) : [] },
      { fixes: (c.kind === 'hands' || c.kind === 'clients') && c.with !== undefined ? waiting.flatMap((x) => this.handOvers(x)) : [], every: true },
      { fixes: waiting.flatMap((x) => this.lateStarts(x)) },
      { fixes: waiting.map((x): DayFix => ({ kind: 'another_day', booking: x.id })) },
    ];
    const out: DayFix[] = [];
    for (const group of groups) {
      const served = new Set<string>();
      for (const fix of group.fixes) {
        if (served.has(fix.booking) || !this.feasible(c, fix)) continue;
        out.push(fix);
        if (!group.every) served.add(fix.booking);
      }
    }
    return out;
  }

  /** This conflict is gone, and every conflict left was there before and is no longer. */
  private feasible(c: DayConflict, fix: DayFix): boolean {
    const subjects = new Set(this.subjects).add(fix.booking);
    const before = this.baselineWith(fix.booking, subjects);
    if (fix.kind === 'another_day') subjects.delete(fix.booking);
    const after = dayConflicts(this.day.cal, applied(this.day.sittings, fix), subjects);
    const target = conflictKey(c);
    return after.every((a) => {
      const key = conflictKey(a);
      const was = before.get(key);
      return key !== target && was !== undefined && a.minutes <= was.minutes;
    });
  }

  /** The day's conflicts as re-planned, with the fixed sitting among the subjects too (its own old conflicts are not new). */
  private baselineWith(booking: string, subjects: ReadonlySet<string>): Map<string, DayConflict> {
    let known = this.baseline.get(booking);
    if (!known) {
      known = new Map(dayConflicts(this.day.cal, this.day.sittings, subjects).map((x) => [conflictKey(x), x]));
      this.baseline.set(booking, known);
    }
    return known;
  }

  /** Other lengths of the sitting's unfinished developing steps within their range: shorter first, least change first. */
  private developing(x: DaySitting): DayFix[] {
    const actual = this.day.actuals.get(x.id)!;
    const grid = this.day.cal.grid;
    const options: Array<{ shorter: boolean; change: number; step: number; minutes: number }> = [];
    x.steps.forEach((step, k) => {
      if (step.kind !== 'developing' || step.state === 'finished' || step.lo === step.hi) return;
      // A running step ends on a grid point, never before now; a planned one lasts a whole number of grid steps.
      const first =
        step.state === 'running' ? Math.max(ceilGrid(step.start + step.lo, grid), this.nowOnGrid) : step.start + Math.ceil(step.lo / grid.g) * grid.g;
      const last = step.state === 'running' ? floorGrid(step.start + step.hi, grid) : step.start + Math.floor(step.hi / grid.g) * grid.g;
      for (let end = first; end <= last; end += grid.g) {
        if (end !== step.end) options.push({ shorter: end < step.end, change: Math.abs(end - step.end), step: k, minutes: end - step.start });
      }
    });
    options.sort((a, b) => Number(b.shorter) - Number(a.shorter) || a.change - b.change || a.step - b.step);
    return options.map((o): DayFix => {
      const steps = chainSteps(x, this.day.now, grid, actual, new Map([[o.step, o.minutes]]));
      return { kind: 'developing', booking: x.id, step: o.step, minutes: o.minutes, sitting: { ...x, steps } };
    });
  }

  private chairs(x: DaySitting): DayFix[] {
    return this.day.cal.chairOrder.filter((chair) => chair !== x.chair).map((chair): DayFix => ({ kind: 'chair', booking: x.id, chair }));
  }

  private basins(x: DaySitting): DayFix[] {
    return x.steps.flatMap((step, k) =>
      step.basin && step.state === 'planned'
        ? this.day.cal.basinOrder.filter((basin) => basin !== step.basin).map((basin): DayFix => ({ kind: 'basin', booking: x.id, step: k, basin }))
        : [],
    );
  }

  /**
   * Stylists with the skill free for the whole sitting at its booked times (free-stylists.ts), other than its own.
   * One index of the day serves every sitting: a sitting's own presence there only marks its own stylist busy.
   */
  private handOvers(x: DaySitting): DayFix[] {
    if (x.skill === undefined) return [];
    this.index ??= buildIndex({ ...this.scenario, bookings: this.day.sittings.map((y) => y.source) });
    return freeStylists(this.index, x.skill, [x.source])
      .filter((stylist) => stylist !== x.stylist)
      .map((stylist): DayFix => ({ kind: 'hand_over', booking: x.id, stylist }));
  }

  /** Every step later by one grid step at a time, up to the salon's limit, never starting before now. */
  private lateStarts(x: DaySitting): DayFix[] {
    const out: DayFix[] = [];
    const g = this.day.cal.grid.g;
    for (let late = g; late <= this.day.ask.lateStartLimitMinutes; late += g) {
      const start = x.steps[0]!.start + late;
      if (start >= this.day.now) out.push({ kind: 'late_start', booking: x.id, start, minutesLate: late });
    }
    return out;
  }
}
