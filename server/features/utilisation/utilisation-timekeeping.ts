/** Plan against actual for the period, from the per-stylist tallies (definitions in docs/utilisation.md). Pure. */
import type { StylistTimekeeping, Timekeeping } from '@shared/schemas/utilisation.schemas';
import type { TimekeepingTally } from './utilisation-timekeeping.repository';

const ratio = (num: number, den: number): number | null => (den === 0 ? null : num / den);
const none: Omit<TimekeepingTally, 'stylistId'> = { sittings: 0, onTime: 0, lateArrivals: 0, plannedMinutes: 0, actualMinutes: 0, overrunMinutes: 0 };

function figures(t: Omit<TimekeepingTally, 'stylistId'>): Timekeeping {
  return {
    sittings: t.sittings,
    onTime: t.onTime,
    onTimeRate: ratio(t.onTime, t.sittings),
    lateArrivals: t.lateArrivals,
    overrunMinutes: t.overrunMinutes,
    overrunPerSitting: ratio(t.overrunMinutes, t.sittings),
    plannedChairHours: t.plannedMinutes / 60,
    actualChairHours: t.actualMinutes / 60,
  };
}

/**
 * The salon's figures (every tally summed, then divided once) and one row per stylist in `stylists` (in that order,
 * zeros for a stylist with no timed sitting), then any other stylist a tally names.
 */
export function timekeepingFigures(
  tallies: TimekeepingTally[],
  stylists: Array<{ stylistId: string; name: string }>,
  nameOf: (id: string) => string,
): Timekeeping & { stylists: StylistTimekeeping[] } {
  const total = { ...none };
  for (const t of tallies) for (const key of Object.keys(none) as Array<keyof typeof none>) total[key] += t[key];
  const byId = new Map(tallies.map((t) => [t.stylistId, t]));
  const listed = new Set(stylists.map((s) => s.stylistId));
  const rows = [...stylists, ...tallies.filter((t) => !listed.has(t.stylistId)).map((t) => ({ stylistId: t.stylistId, name: nameOf(t.stylistId) }))];
  return {
    ...figures(total),
    stylists: rows.map((s) => ({ stylistId: s.stylistId, name: s.name, ...figures(byId.get(s.stylistId) ?? none) })),
  };
}
