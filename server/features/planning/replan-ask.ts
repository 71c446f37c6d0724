import type { ReplanAnswer, ReplanAskInput, ReplanFix as EngineFix, Scenario } from '@shared/engine/engine';
import type { ConflictKind, ReplanFix } from '@shared/schemas/replan.schemas';
import { instantAt, localDateTimeOf } from '@shared/time/salon-time';
import type { DayRunSitting } from './day-runs.repository';
import { localEarliest } from './engine-request';

/*
 * Between the book and the engine's re-plan: the ask built from the stored actual times (each step tagged with its
 * booking_steps id and label), and the answer mapped back to sitting and step ids. A step goes to the engine by its
 * place in the scenario's booking, read from the book's own list of step ids, and comes back by its id.
 */

/** A step of the stylist's day as re-planned. */
export interface ReplannedStep {
  stepId: string;
  label: string;
  kind: 'hands_on' | 'developing' | 'basin';
  start: string;
  end: string;
  state: 'finished' | 'running' | 'planned';
  basinId: string | null;
}

export interface ReplannedSitting {
  sittingId: string;
  chairId: string;
  inProgress: boolean;
  moved: boolean;
  steps: ReplannedStep[];
}

/** A fix the engine offers; a developing fix carries the sitting's steps as they would then run (to be written as they are). */
export interface OfferedFix {
  fix: ReplanFix;
  steps?: ReplannedStep[];
}

/** A broken placement rule: `sittingId` suffers (the later booking; for hours and closing the running one), `causeId` is the running one. */
export interface ReplanConflict {
  kind: ConflictKind;
  sittingId: string;
  causeId: string | null;
  minutes: number;
  start: string;
  end: string;
  /** Feasible fixes, best first. */
  fixes: OfferedFix[];
  /**
   * The engine found a free stylist with the skill, but the suffering sitting is one of several of its booking, and
   * every sitting of a booking stays with the booking's one stylist: no hand-over is offered (the desk is told why).
   */
  handOverHeld?: true;
}

/** One stylist's day re-planned from the actual times, in the server's ids. */
export interface StylistReplan {
  stylistId: string;
  sittings: ReplannedSitting[];
  conflicts: ReplanConflict[];
  freed: Array<{ start: string; end: string; minutes: number }>;
}

/** The scenario's bookings and their step ids, as the day has run. */
export interface RunBook {
  bookings: Scenario['bookings'];
  stepIds: Map<string, string[]>;
}

const started = (s: DayRunSitting) => s.steps.some((st) => st.actualStart !== null);

/** Stylists with a sitting under way or run today: the days worth re-planning. */
export const stylistsUnderWay = (runs: DayRunSitting[]): string[] => [...new Set(runs.filter(started).map((s) => s.stylistId))].sort();

/**
 * The book as the day has run: a finished sitting's steps that never ran (left open) are gone, as the client has
 * left; the engine would otherwise plan them after now.
 */
export function followTheRun(book: RunBook, runs: DayRunSitting[]): RunBook {
  const ran = new Map(
    runs.filter((s) => s.status === 'finished').map((s) => [s.id, new Set(s.steps.filter((st) => st.actualStart !== null).map((st) => st.id))]),
  );
  const bookings: Scenario['bookings'] = [];
  const stepIds = new Map(book.stepIds);
  for (const b of book.bookings) {
    const kept = ran.get(b.id);
    const ids = book.stepIds.get(b.id) ?? [];
    if (!kept) {
      bookings.push(b);
      continue;
    }
    const keep = ids.map((id) => kept.has(id));
    const steps = b.steps.filter((_, k) => keep[k]);
    stepIds.set(
      b.id,
      ids.filter((_, k) => keep[k]),
    );
    if (steps.length > 0) bookings.push({ ...b, steps });
  }
  return { bookings, stepIds };
}

/** The engine's ask for one stylist's day at `now`: every sitting of theirs that day, its steps tagged by id. */
export function replanAsk(stylistId: string, now: Date, zone: string, lateStartLimitMinutes: number, runs: DayRunSitting[], book: RunBook): ReplanAskInput {
  const local = (d: Date) => localDateTimeOf(d, zone);
  const scenarioIds = new Set(book.bookings.map((b) => b.id));
  return {
    stylist: stylistId,
    now: local(now),
    lateStartLimitMinutes,
    sittings: runs
      .filter((s) => s.stylistId === stylistId && scenarioIds.has(s.id))
      .map((s) => {
        const order = book.stepIds.get(s.id) ?? [];
        return {
          booking: s.id,
          skill: s.skill,
          steps: s.steps.flatMap((st) => {
            const step = order.indexOf(st.id);
            if (step < 0) return []; // a step left open by a finished sitting is not in the book as it ran
            return [
              {
                step,
                id: st.id,
                label: st.label,
                ...(st.actualStart ? { actualStart: local(st.actualStart) } : {}),
                ...(st.actualEnd ? { actualEnd: local(st.actualEnd) } : {}),
                ...(st.minMinutes !== null && st.maxMinutes !== null ? { minMinutes: st.minMinutes, maxMinutes: st.maxMinutes } : {}),
              },
            ];
          }),
        };
      }),
  };
}

/** Re-planned steps in the server's ids; every step of the stylist's sittings went in tagged with its id. */
const stepsOf = (steps: ReplanAnswer['sittings'][number]['steps']): ReplannedStep[] =>
  steps.flatMap((st) =>
    st.id ? [{ stepId: st.id, label: st.label ?? '', kind: st.kind, start: st.start, end: st.end, state: st.state, basinId: st.basin ?? null }] : [],
  );

/** A fix in the server's ids; null when a step it names cannot be found (never expected: every step is tagged). */
function fixOf(f: EngineFix, stepIds: Map<string, string[]>): OfferedFix | null {
  const offered = (fix: ReplanFix): OfferedFix => ({ fix });
  switch (f.kind) {
    case 'developing':
      return f.id ? { fix: { kind: 'developing', sittingId: f.booking, stepId: f.id, minutes: f.minutes }, steps: stepsOf(f.steps) } : null;
    case 'chair':
      return offered({ kind: 'chair', sittingId: f.booking, chairId: f.chair });
    case 'basin': {
      // The engine names the step by its place in the scenario's booking: the book's own list gives its id.
      const stepId = stepIds.get(f.booking)?.[f.step];
      return stepId ? offered({ kind: 'basin', sittingId: f.booking, stepId, basinId: f.basin }) : null;
    }
    case 'hand_over':
      return offered({ kind: 'hand_over', sittingId: f.booking, stylistId: f.stylist });
    case 'late_start':
      return offered({ kind: 'late_start', sittingId: f.booking, minutesLate: f.minutesLate, start: f.start });
    case 'another_day':
      return offered({ kind: 'another_day', sittingId: f.booking });
  }
}

/** Sittings of bookings with more than one sitting: they stay with their booking's stylist, so none is handed over. */
export const sittingsKeptWithStylist = (runs: DayRunSitting[]): Set<string> => new Set(runs.filter((s) => s.sittingsInBooking > 1).map((s) => s.id));

/**
 * The engine's answer in the server's ids: sittings and steps by id, fixes naming sittings, steps, chairs, basins,
 * stylists. A hand-over of a sitting in `keptWithStylist` is left out and the conflict says so.
 */
export function fromAnswer(answer: ReplanAnswer, stepIds: Map<string, string[]>, keptWithStylist: ReadonlySet<string> = new Set()): StylistReplan {
  const held = (f: EngineFix) => f.kind === 'hand_over' && keptWithStylist.has(f.booking);
  return {
    stylistId: answer.stylist,
    sittings: answer.sittings.map((s) => ({
      sittingId: s.booking,
      chairId: s.chair,
      inProgress: s.inProgress,
      moved: s.moved,
      steps: stepsOf(s.steps),
    })),
    conflicts: answer.conflicts.map((c) => ({
      kind: c.kind,
      sittingId: c.booking,
      causeId: c.with ?? null,
      minutes: c.minutes,
      start: c.start,
      end: c.end,
      fixes: c.fixes.flatMap((f) => (held(f) ? [] : (fixOf(f, stepIds) ?? []))),
      ...(c.fixes.some(held) ? { handOverHeld: true as const } : {}),
    })),
    freed: answer.freed.map((f) => ({ start: f.start, end: f.end, minutes: f.minutes })),
  };
}

/**
 * A re-planned sitting's steps as the book can hold them (booked times lie on the salon's grid): the steps not
 * finished, planned ones at their re-planned times and a running one from its actual start rounded up onto the
 * grid (so the engine, reading it back, chains it to the same end). Finished steps keep their booked times: they
 * are history, and their actual times stay beside them.
 */
export function bookableSteps(steps: ReplannedStep[], zone: string, granularity: number): Array<{ id: string; start: Date; end: Date }> {
  return steps
    .filter((s) => s.state !== 'finished')
    .map((s) => {
      const start = s.state === 'running' ? onGrid(new Date(s.start), zone, granularity) : new Date(s.start);
      return { id: s.stepId, start, end: new Date(s.end) };
    });
}

/** The instant's minute (as the engine reads actual times) rounded up onto the grid. */
function onGrid(at: Date, zone: string, granularity: number): Date {
  const minute = new Date(Math.floor(at.getTime() / 60_000) * 60_000);
  const text = localEarliest(minute, zone, granularity);
  return instantAt(text.slice(0, 10), zone, text.slice(11))!; // a wall time read from an instant is a real one
}
