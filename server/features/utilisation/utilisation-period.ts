import { DateTime } from 'luxon';
import { MAX_HORIZON_DAYS } from '@shared/engine/engine';
import type { PeriodKind } from '@shared/schemas/utilisation.schemas';

export interface Period {
  kind: PeriodKind;
  /** Local dates in salon time: `from` inclusive, `to` exclusive. */
  from: string;
  to: string;
  days: number;
}

/** A stretch measured by one engine scenario, cut into weeks (local dates, the last one exclusive). */
export interface Chunk {
  from: string;
  to: string;
  weekCuts: string[];
}

const day = (s: string) => DateTime.fromISO(s, { zone: 'UTC' });
const iso = (d: DateTime) => d.toISODate()!;

/** The period a (validated) query names, with `today` (salon time) standing in for a missing date. */
export function resolvePeriod(query: { period: PeriodKind; date?: string; from?: string; to?: string }, today: string): Period {
  const at = day(query.date ?? today);
  let from: DateTime;
  let to: DateTime;
  if (query.period === 'custom') {
    from = day(query.from!);
    to = day(query.to!).plus({ days: 1 });
  } else {
    const unit = query.period;
    from = at.startOf(unit === 'week' ? 'week' : unit); // luxon weeks start on Monday (ISO 8601)
    to = from.plus({ [`${unit}s`]: 1 });
  }
  return { kind: query.period, from: iso(from), to: iso(to), days: Math.round(to.diff(from, 'days').days) };
}

/**
 * Week boundaries (Mondays) inside the period, grouped into engine scenarios of at most MAX_HORIZON_DAYS
 * days. A week is never split between two scenarios, so each week's figures come from one engine index.
 */
export function chunksOf(period: Period): Chunk[] {
  const cuts = [period.from];
  for (let d = day(period.from).startOf('week').plus({ weeks: 1 }); iso(d) < period.to; d = d.plus({ weeks: 1 })) cuts.push(iso(d));
  cuts.push(period.to);
  const chunks: Chunk[] = [];
  // The chunk being built: its cuts, the first of them and the last.
  let current = [period.from];
  let first = period.from;
  let last = period.from;
  for (const cut of cuts.slice(1)) {
    if (current.length > 1 && day(cut).diff(day(first), 'days').days > MAX_HORIZON_DAYS) {
      chunks.push({ from: first, to: last, weekCuts: current });
      current = [last];
      first = last;
    }
    current.push(cut);
    last = cut;
  }
  chunks.push({ from: first, to: last, weekCuts: current });
  return chunks;
}
