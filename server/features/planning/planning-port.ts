/**
 * The planning port: the one way the server asks the booking engine (shared/engine, pure). Each function reads the
 * salon's setup once (opening hours, active stylists with their hours, chairs, basins, their names), reads the book
 * once for each stretch of days it needs, asks the engine and hands back its answer in the server's terms. Steps go
 * into the engine with their id and label and come back with them; where a sitting may start (what a client's skin
 * test allows) goes in as a limit the engine searches within.
 */
import { DateTime } from 'luxon';
import type { Db } from '@server/db/database';
import {
  breakDownOccupancy,
  findFreeStylists,
  findWindows,
  MAX_HORIZON_DAYS,
  planOptions,
  type HandsFreeWindow,
  type OccupancyBreakdown,
  type Option,
  type Scenario,
} from '@shared/engine/engine';
import type { StepPlan } from '@shared/schemas/step-plan.schemas';
import { AppError } from '@server/lib/app-error';
import {
  calendarsOf,
  extendSalonBook,
  loadSalonBook,
  loadSalonSetup,
  type BookOptions,
  type Horizon,
  type PlanningSalon,
  type SalonBook,
  type SalonSetup,
} from './salon-calendars.repository';
import { horizonFor, localEarliest, toEngineSittings, type Names, type StartLimit } from './engine-request';
import { planBetween, planExactlyAt, type ExactRequest } from './plan-at';
import { placedOption, type PlacedOption } from './placed-option';

export type { Horizon, PlanningSalon } from './salon-calendars.repository';
export { planningSalon } from './salon-calendars.repository';
export type { Names, StartLimit } from './engine-request';
export { horizonFor, localEarliest, toBookingOption } from './engine-request';
export type { PlacedOption, PlacedSitting, PlacedStep } from './placed-option';

const noSuchStylist = () => new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { stylistId: 'No such stylist in this salon.' });

function namesOf(setup: SalonSetup): Names {
  const map = (rows: Array<{ id: string; name: string }>) => new Map(rows.map((r) => [r.id, r.name]));
  return { stylists: map(setup.stylists), chairs: map(setup.chairs), basins: map(setup.basins) };
}

export interface OptionsAsk {
  skill: string;
  /** One stylist, or null for any with the skill. */
  stylistId: string | null;
  plan: StepPlan;
  /** No start before this (rounded up onto the salon's grid). */
  earliest: Date;
  /**
   * Horizons tried in turn, each from the same first day and longer than the last: the first whose answer is full
   * answers, and a longer one reads only the days the shorter one lacked.
   */
  horizons: Horizon[];
  limit: number;
  spread: 'day' | 'none';
  /** A booking left out of the book (the one whose sitting is being moved). */
  except?: string;
  /** Per sitting, the stretches its start may fall in (null or absent: anywhere). */
  allowedStarts?: ReadonlyArray<StartLimit[] | null>;
}

/** The engine's options for a service, earliest first, with the names to show them by. */
export async function optionsFor(db: Db, salon: PlanningSalon, ask: OptionsAsk): Promise<{ options: PlacedOption[]; names: Names }> {
  const setup = await loadSalonSetup(db, salon.id);
  if (ask.stylistId && !setup.stylists.some((s) => s.id === ask.stylistId)) throw noSuchStylist();
  const request = {
    skill: ask.skill,
    stylist: ask.stylistId,
    earliest: localEarliest(ask.earliest, salon.timeZone, salon.granularityMinutes),
    sittings: toEngineSittings(ask.plan, salon.timeZone, ask.allowedStarts),
    limit: ask.limit,
    spread: ask.spread,
  };
  const options: BookOptions = { except: ask.except };
  let book: SalonBook | null = null;
  let found: Option[] = [];
  for (const horizon of ask.horizons) {
    book = book ? await extendSalonBook(db, salon, setup, book, horizon.to, options) : await loadSalonBook(db, salon, setup, horizon, options);
    found = planOptions({ ...calendarsOf(salon, setup, book), request }).options;
    if (found.length >= ask.limit) break;
  }
  return { options: found.map(placedOption), names: namesOf(setup) };
}

export interface Placement extends ExactRequest {
  /** Place it at the earliest start from `start` up to this one (a window fill); without it, exactly at `start`. */
  latestStart?: Date;
}

/** A placed plan, or why there is none; `field` names the stylist when they cannot do this work at all. */
export type PlacementAnswer = { plan: PlacedOption } | { reason: string; field?: 'stylistId' };

/**
 * The engine's plan for each placement at its start, against the book without `except`; one answer per placement.
 * Placements whose days touch share one read of the book.
 */
export async function exactPlan(db: Db, salon: PlanningSalon, placements: readonly Placement[], except?: string): Promise<PlacementAnswer[]> {
  if (placements.length === 0) return [];
  const setup = await loadSalonSetup(db, salon.id);
  const localDate = (d: Date) => DateTime.fromJSDate(d, { zone: salon.timeZone }).toISODate()!;
  const calendars = await booksFor(
    db,
    salon,
    setup,
    placements.map((p) => horizonFor(localDate(p.start), p.plan, 1)),
    { except },
  );
  return placements.map((p, i): PlacementAnswer => {
    const stylist = setup.stylists.find((s) => s.id === p.stylistId);
    if (!stylist) throw noSuchStylist();
    // Asked plainly, or the engine's answer would blame the hours for a stylist who cannot do the work.
    if (!stylist.skills.includes(p.skill)) return { reason: `This stylist does not have the "${p.skill}" skill this service needs.`, field: 'stylistId' };
    const scenario = calendars[i]!; // booksFor answers one scenario per horizon, in order
    return p.latestStart ? planBetween(scenario, p, p.latestStart) : planExactlyAt(scenario, p);
  });
}

/** Every hands-free window on one local date, with the window fits that can go in it. */
export async function windowsOn(db: Db, salon: PlanningSalon, date: string, fits: Scenario['fits']): Promise<HandsFreeWindow[]> {
  const setup = await loadSalonSetup(db, salon.id);
  const book = await loadSalonBook(db, salon, setup, { from: date, to: DateTime.fromISO(date).plus({ days: 1 }).toISODate()! });
  return findWindows({ ...calendarsOf(salon, setup, book), fits }).windows;
}

/** Figures count work, not unpaid online holds (a hold keeps a time for a few minutes while someone pays). */
const FIGURES: BookOptions = { holds: false };

/** The scenario the occupancy figures of a horizon are measured on (as the owner may download it). */
export async function occupancyScenario(db: Db, salon: PlanningSalon, horizon: Horizon): Promise<Scenario> {
  const setup = await loadSalonSetup(db, salon.id);
  return calendarsOf(salon, setup, await loadSalonBook(db, salon, setup, horizon, FIGURES));
}

/** The engine's occupancy and the minutes behind it for each part (a horizon and the local dates cutting it into weeks). */
export async function occupancyOver(db: Db, salon: PlanningSalon, parts: ReadonlyArray<{ horizon: Horizon; cuts: string[] }>): Promise<OccupancyBreakdown[]> {
  const setup = await loadSalonSetup(db, salon.id);
  const books = await Promise.all(parts.map((p) => loadSalonBook(db, salon, setup, p.horizon, FIGURES)));
  return parts.map((p, i) => breakDownOccupancy(calendarsOf(salon, setup, books[i]!), p.cuts));
}

export interface TakeOverAsk {
  skill: string;
  /** The booking's sittings to take over, as they stand in the book. */
  sittingIds: string[];
  /** Local dates covering those sittings. */
  horizon: Horizon;
}

/** For each ask, the stylists who could take its sittings over exactly as they stand (the booked one included). */
export async function freeStylists(db: Db, salon: PlanningSalon, asks: readonly TakeOverAsk[]): Promise<Array<Array<{ id: string; name: string }>>> {
  const setup = await loadSalonSetup(db, salon.id);
  const names = namesOf(setup).stylists;
  const calendars = await booksFor(
    db,
    salon,
    setup,
    asks.map((a) => a.horizon),
    {},
  );
  return asks.map((ask, i) => {
    const mine = new Set(ask.sittingIds);
    const scenario = calendars[i]!; // booksFor answers one scenario per horizon, in order
    const all = scenario.bookings;
    const others = { ...scenario, bookings: all.filter((b) => !mine.has(b.id)) };
    return findFreeStylists(
      others,
      ask.skill,
      all.filter((b) => mine.has(b.id)),
    ).map((id) => ({ id, name: names.get(id) ?? id }));
  });
}

/**
 * The calendars for each horizon, reading the book once per run of horizons whose days overlap or touch (kept
 * within the engine's longest horizon): the engine answers each question from its own days, so a longer book
 * around them changes nothing. (Hours lines written in Set-up carry their first week, so an every-other-week rule
 * does not count its weeks from wherever a horizon happens to begin; see shared/engine/weekly-rule.ts.)
 */
async function booksFor(db: Db, salon: PlanningSalon, setup: SalonSetup, horizons: Horizon[], options: BookOptions): Promise<Scenario[]> {
  const days = (a: string, b: string) => DateTime.fromISO(b).diff(DateTime.fromISO(a), 'days').days;
  const order = horizons.map((h, i) => ({ h, i })).sort((a, b) => (a.h.from < b.h.from ? -1 : a.h.from > b.h.from ? 1 : 0));
  const runs: Array<{ horizon: Horizon; members: number[] }> = [];
  for (const { h, i } of order) {
    const run = runs.at(-1);
    if (run && h.from <= run.horizon.to) {
      const to = h.to > run.horizon.to ? h.to : run.horizon.to;
      if (days(run.horizon.from, to) <= MAX_HORIZON_DAYS) {
        run.horizon = { from: run.horizon.from, to };
        run.members.push(i);
        continue;
      }
    }
    runs.push({ horizon: { ...h }, members: [i] });
  }
  const books = await Promise.all(runs.map((r) => loadSalonBook(db, salon, setup, r.horizon, options)));
  const out: Scenario[] = [];
  runs.forEach((r, k) => {
    const calendars = calendarsOf(salon, setup, books[k]!);
    for (const i of r.members) out[i] = calendars;
  });
  return out;
}
