import type { Db } from '@server/db/database';
import { MAX_HORIZON_DAYS, type HourCell, type OccupancyMinutes, type Scenario } from '@shared/engine/engine';
import { AppError } from '@server/lib/app-error';
import { occupancyOver, occupancyScenario, planningSalon, type PlanningSalon } from '../planning';
import { chunksOf, type Period } from './utilisation-period';

export interface PeriodOccupancy {
  /** The engine's three figures for the period. */
  chairOccupancy: number | null;
  windowUse: number | null;
  handsOnShare: Record<string, number | null>;
  total: OccupancyMinutes;
  /** One per week of the period, in order. */
  weeks: OccupancyMinutes[];
  cells: HourCell[];
  scenarios: number;
}

const ratio = (num: number, den: number): number | null => (den === 0 ? null : num / den);

function add(a: OccupancyMinutes, b: OccupancyMinutes): OccupancyMinutes {
  const stylists = { ...a.stylists };
  for (const [id, s] of Object.entries(b.stylists)) {
    const had = stylists[id] ?? { handsOn: 0, onClock: 0 };
    stylists[id] = { handsOn: had.handsOn + s.handsOn, onClock: had.onClock + s.onClock };
  }
  return {
    chairHeld: a.chairHeld + b.chairHeld,
    chairOpen: a.chairOpen + b.chairOpen,
    stylists,
    windowUsed: a.windowUsed + b.windowUsed,
    windowFree: a.windowFree + b.windowFree,
  };
}

/**
 * The engine's occupancy over the period. A period of up to MAX_HORIZON_DAYS days is one scenario and
 * its figures are the engine's occupancy answer itself (`measureOccupancy`, on the same index); a longer one is measured in whole-week scenarios
 * whose minutes are summed before dividing once (the same definitions, so the figures agree).
 */
export async function measurePeriod(db: Db, salon: PlanningSalon, period: Period): Promise<PeriodOccupancy> {
  const chunks = chunksOf(period);
  const measured = await occupancyOver(
    db,
    salon,
    chunks.map((c) => ({ horizon: { from: c.from, to: c.to }, cuts: c.weekCuts })),
  );
  const total = measured.map((m) => m.total).reduce(add);
  const cells = new Map<number, HourCell>();
  for (const c of measured.flatMap((m) => m.cells)) {
    const key = c.weekday * 24 + c.hour;
    const had = cells.get(key);
    cells.set(key, had ? { ...had, chairHeld: had.chairHeld + c.chairHeld, chairOpen: had.chairOpen + c.chairOpen } : { ...c });
  }
  const answer =
    measured.length === 1
      ? measured[0]!.answer
      : {
          chairOccupancy: ratio(total.chairHeld, total.chairOpen),
          windowUse: ratio(total.windowUsed, total.windowUsed + total.windowFree),
          handsOnShare: Object.fromEntries(Object.entries(total.stylists).map(([id, s]) => [id, ratio(s.handsOn, s.onClock)])),
        };
  return {
    ...answer,
    total,
    weeks: measured.flatMap((m) => m.parts),
    cells: [...cells.values()].sort((a, b) => a.weekday - b.weekday || a.hour - b.hour),
    scenarios: chunks.length,
  };
}

/** The exact scenario the engine gets for the period; one scenario covers at most MAX_HORIZON_DAYS days. */
export async function periodScenario(db: Db, salonId: string, period: Period): Promise<Scenario> {
  const chunks = chunksOf(period);
  if (chunks.length > 1) {
    const message = `One scenario covers at most ${MAX_HORIZON_DAYS} days; export a shorter period`;
    throw new AppError('VALIDATION_FAILED', 400, message, { to: message });
  }
  return occupancyScenario(db, await planningSalon(db, salonId), { from: period.from, to: period.to });
}
