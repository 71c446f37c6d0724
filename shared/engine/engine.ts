/**
 * Public entry of the booking engine. Pure: every calendar and "now" (request.earliest) is input.
 *
 *   const scenario = parseScenario(json);        // throws ScenarioError naming the field
 *   planOptions(scenario); findWindows(scenario); measureOccupancy(scenario);
 *
 * The query functions re-check the parts they use, so a Scenario built in code (e.g. by the
 * server from the database) gets the same ScenarioError rather than a partial answer.
 */
import type { Option, OptionStep, OptionsAnswer, WindowsAnswer, OccupancyAnswer } from './answers';
import { checkFits, compileRequest } from './compile-request';
import { measure } from './occupancy';
import { breakDown, type HourCell, type OccupancyMinutes } from './occupancy-breakdown';
import { parseLocalDate } from './local-time';
import { findOptions } from './options';
import { buildIndex } from './resource-index';
import { ScenarioError, fromZodError } from './scenario-error';
import { ScenarioSchema, type Booking, type Scenario } from './scenario.schemas';
import { freeStylists } from './free-stylists';
import { replan } from './replan';
import type { ReplanAnswer } from './replan-answer';
import type { ReplanAskInput } from './replan.schemas';
import { listWindows } from './windows';

export type * from './answers';
export type * from './replan-answer';
export type { ReplanAsk, ReplanAskInput } from './replan.schemas';
export { ReplanAskSchema } from './replan.schemas';
export type { Scenario, ScenarioInput, Booking, BookedStep, ServiceRequest, RequestStep, HoursRule, StartStretch } from './scenario.schemas';
export { ScenarioSchema } from './scenario.schemas';
export { ScenarioError } from './scenario-error';
export { MAX_HORIZON_DAYS } from './compile-context';
export type { HourCell, OccupancyMinutes } from './occupancy-breakdown';

export interface OccupancyBreakdown {
  /** The occupancy answer itself (`measureOccupancy`), from the same index. */
  answer: OccupancyAnswer;
  total: OccupancyMinutes;
  parts: OccupancyMinutes[];
  cells: HourCell[];
}

/** Parses and fully validates a scenario (an object, or JSON text). */
export function parseScenario(json: unknown): Scenario {
  let value = json;
  if (typeof json === 'string') {
    try {
      value = JSON.parse(json);
    } catch (e) {
      throw new ScenarioError('scenario', `is not valid JSON (${(e as Error).message})`);
    }
  }
  const parsed = ScenarioSchema.safeParse(value);
  if (!parsed.success) throw fromZodError(parsed.error);
  const idx = buildIndex(parsed.data);
  if (parsed.data.request) compileRequest(idx.ctx, parsed.data, idx.stylistById);
  checkFits(idx.ctx, parsed.data);
  return parsed.data;
}

/** The K earliest feasible (stylist, start) pairs for the request, each with one plan. */
export function planOptions(scenario: Scenario): OptionsAnswer {
  const idx = buildIndex(scenario);
  const req = compileRequest(idx.ctx, scenario, idx.stylistById);
  const fmt = idx.ctx.clock.format;
  const options = findOptions(idx, req).map((o): Option => ({
    stylist: o.stylist,
    sittings: o.sittings.map((s) => ({
      chair: s.chair,
      steps: s.steps.map((step) => {
        // Plain assignments rather than spreads: this runs for every step of every option.
        const out: OptionStep = { kind: step.kind, start: fmt(step.start), end: fmt(step.end) };
        if (step.basin) out.basin = step.basin;
        if (step.id !== undefined) out.id = step.id;
        if (step.label !== undefined) out.label = step.label;
        return out;
      }),
    })),
  }));
  return { options };
}

/** Every maximal hands-free window in the horizon, with the fits that can go in it. */
export function findWindows(scenario: Scenario): WindowsAnswer {
  const idx = buildIndex(scenario);
  checkFits(idx.ctx, scenario);
  const fmt = idx.ctx.clock.format;
  return {
    windows: listWindows(idx, scenario.fits).map((w) => ({
      stylist: idx.stylists[w.stylist]!.id,
      start: fmt(w.start),
      end: fmt(w.end),
      fits: w.fits,
    })),
  };
}

/** Chair occupancy, hands-on share per stylist and window use over the horizon. */
export function measureOccupancy(scenario: Scenario): OccupancyAnswer {
  return measure(buildIndex(scenario));
}

/**
 * The minutes behind `measureOccupancy` for the same scenario: the whole horizon, each part between
 * consecutive local dates in `cuts` (inside the horizon), and local weekday × hour cells.
 */
export function breakDownOccupancy(scenario: Scenario, cuts: string[]): OccupancyBreakdown {
  const idx = buildIndex(scenario);
  const at = cuts.map((date, i) => {
    const day = parseLocalDate(date);
    if (day === null || day < idx.ctx.fromDay || day > idx.ctx.toDay) throw new ScenarioError(`cuts[${i}]`, `${date} is not a date inside the horizon`);
    // fromDay <= day <= toDay, and dayStarts runs from fromDay to toDay inclusive.
    return idx.ctx.dayStarts[day - idx.ctx.fromDay]!;
  });
  return { answer: measure(idx), ...breakDown(idx, at) };
}

/** Stylists who could take over the given sittings as they stand (see free-stylists.ts). */
export function findFreeStylists(scenario: Scenario, skill: string, sittings: Booking[]): string[] {
  return freeStylists(buildIndex(scenario), skill, sittings);
}

/**
 * Re-plans the rest of one stylist's day from the actual step times (see replan.ts): the day as it now runs, the
 * conflicts with bookings kept where they are, and feasible fixes for each, best first.
 */
export function replanDay(scenario: Scenario, ask: ReplanAskInput): ReplanAnswer {
  return replan(scenario, ask);
}
