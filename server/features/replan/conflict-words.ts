import { formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import type { ConflictKind, ConflictView, FixView, FreedStretch, ReplanFix, ReplanSummary } from '@shared/schemas/replan.schemas';
import { instantIso } from '@shared/time/salon-time';
import type { OfferedFix, ReplanConflict, StylistReplan } from '../planning';
import type { ConflictSittingRow } from './conflict-sittings.repository';

/** What the desk reads a re-plan by: the sittings it names, the salon's chairs, basins and stylists, and what clients were told. */
export interface ReplanNames {
  timeZone: string;
  granularityMinutes: number;
  sittings: Map<string, ConflictSittingRow>;
  chairs: Map<string, string>;
  basins: Map<string, string>;
  stylists: Map<string, string>;
  told: Map<string, Array<{ minutesLate: number; at: Date }>>;
}

/** "Jo Park", or what an online hold (no client yet) is called. */
const who = (s: ConflictSittingRow | undefined) => s?.clientName || 'An online hold';

const rule: Record<ConflictKind, (n: { stylist: string; chair: string }) => string> = {
  hands: ({ stylist }) => `both need ${stylist}’s hands`,
  clients: ({ stylist }) => `${stylist} would have more clients in chairs than they take at once`,
  chair: ({ chair }) => `both need ${chair}`,
  basin: () => 'both need the same basin',
  hours: () => '',
  closing: () => '',
};

function conflictWords(c: ReplanConflict, names: ReplanNames, stylist: string): string {
  const at = (iso: Date | string) => formatTime(iso, formatFor(names.timeZone));
  const suffering = names.sittings.get(c.sittingId);
  if (c.kind === 'hours') return `${who(suffering)}’s sitting now runs ${c.minutes} min past ${stylist}’s working hours.`;
  if (c.kind === 'closing') return `${who(suffering)}’s sitting now runs ${c.minutes} min past closing time.`;
  const cause = c.causeId ? names.sittings.get(c.causeId) : undefined;
  const chair = names.chairs.get(suffering?.chairId ?? '') ?? 'the same chair';
  const later = suffering ? `${who(suffering)}’s ${at(suffering.start)}` : 'a later booking';
  return `${who(cause)}’s sitting now runs ${c.minutes} min into ${later}: ${rule[c.kind]({ stylist, chair })}.`;
}

/** The fix in plain words; a developing fix reads the step's label and its length in the re-plan. */
function fixWords(offered: OfferedFix, names: ReplanNames, replan: StylistReplan): string {
  const fix = offered.fix;
  const at = (iso: Date | string) => formatTime(iso, formatFor(names.timeZone));
  const sitting = names.sittings.get(fix.sittingId);
  const client = who(sitting);
  switch (fix.kind) {
    case 'developing': {
      const step = replan.sittings.flatMap((s) => s.steps).find((s) => s.stepId === fix.stepId);
      const now = step ? Math.round((Date.parse(step.end) - Date.parse(step.start)) / 60_000) : fix.minutes;
      return `${fix.minutes < now ? 'Shorten' : 'Lengthen'} “${step?.label ?? 'developing'}” for ${client} to ${fix.minutes} min`;
    }
    case 'chair':
      return `Seat ${client} in ${names.chairs.get(fix.chairId) ?? 'another chair'}`;
    case 'basin':
      return `Use ${names.basins.get(fix.basinId) ?? 'another basin'} for ${client}’s basin step`;
    case 'hand_over':
      return `Hand ${client} over to ${names.stylists.get(fix.stylistId) ?? 'another stylist'}${sitting ? ` at ${at(sitting.start)}` : ''}`;
    case 'late_start':
      return `Start ${client} ${fix.minutesLate} min late, at ${at(fix.start)}, and tell them`;
    case 'another_day':
      return `Move ${client} to another day`;
  }
}

/** Why a free stylist is not offered: a booking's sittings all stay with its one stylist (`bookings.stylist_id`). */
const heldWords = (s: ConflictSittingRow | undefined) =>
  `not handed over: ${who(s)}’s booking has more than one sitting, and every sitting of a booking stays with its stylist${s ? `, ${s.stylistName}` : ''}`;

/**
 * The delay a later client would be told of: the least late start that works, or else until the earlier sitting is
 * out of their way (the end of the conflict, from their booked start), rounded up to the salon's grid. None for hours
 * and closing (no one waits) or an online hold.
 */
function tellMinutes(c: ReplanConflict, names: ReplanNames): number | null {
  const suffering = names.sittings.get(c.sittingId);
  if (!c.causeId || !suffering?.clientId) return null;
  const late = c.fixes.find((f): f is OfferedFix & { fix: Extract<ReplanFix, { kind: 'late_start' }> } => f.fix.kind === 'late_start');
  if (late) return late.fix.minutesLate;
  const g = names.granularityMinutes;
  return Math.max(g, Math.ceil((Date.parse(c.end) - suffering.start.getTime()) / 60_000 / g) * g);
}

/** The re-plans of the day in the desk's words: each conflict named by its clients and times, each fix in plain words. */
export function describeReplans(replans: StylistReplan[], names: ReplanNames): ReplanSummary {
  const iso = (d: Date) => instantIso(d, names.timeZone);
  const ref = (id: string | null) => {
    const s = id ? names.sittings.get(id) : undefined;
    return s ? { bookingId: s.bookingId, sittingId: s.sittingId, seq: s.seq, clientName: who(s), stylistName: s.stylistName, start: iso(s.start) } : null;
  };
  const conflicts: ConflictView[] = replans.flatMap((replan) => {
    const stylist = names.stylists.get(replan.stylistId) ?? 'the stylist';
    return replan.conflicts.flatMap((c) => {
      const sitting = ref(c.sittingId);
      if (!sitting) return []; // not this salon's (never expected: the port reads one salon)
      const fixes = c.fixes.flatMap((f): FixView[] => {
        const target = names.sittings.get(f.fix.sittingId);
        return target ? [{ bookingId: target.bookingId, fix: f.fix, words: fixWords(f, names, replan) }] : [];
      });
      const words = conflictWords(c, names, stylist);
      const held = c.handOverHeld ? heldWords(names.sittings.get(c.sittingId)) : null;
      // Why no hand-over, beside the fix offered in its place (the next one after it in the order), else the conflict.
      const instead = held ? fixes.find((f) => f.fix.kind === 'late_start' || f.fix.kind === 'another_day') : undefined;
      if (held && instead) instead.words += ` (${held})`;
      return [
        {
          kind: c.kind,
          stylistId: replan.stylistId,
          sitting,
          cause: ref(c.causeId),
          minutes: c.minutes,
          start: c.start,
          end: c.end,
          words: held && !instead ? `${words} ${held[0]!.toUpperCase()}${held.slice(1)}.` : words,
          fixes,
          tellMinutes: tellMinutes(c, names),
          told: (names.told.get(c.sittingId) ?? []).map((t) => ({ minutesLate: t.minutesLate, at: iso(t.at) })),
        },
      ];
    });
  });
  const freed: FreedStretch[] = replans.flatMap((r) => r.freed.map((f) => ({ stylistId: r.stylistId, ...f })));
  return { conflicts, freed };
}
