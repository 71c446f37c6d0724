import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { DayConflicts, ReplanSummary, StylistDayRun } from '@shared/schemas/replan.schemas';
import type { Salon } from '@shared/schemas/salon.schemas';
import { instantIso, localDateOf } from '@shared/time/salon-time';
import { AppError } from '@server/lib/app-error';
import { findStaffIdForUser, listBasins, listChairs, listStylists } from '../bookings';
import { runningLateTold } from '../messages';
import { replanDayFor, replanDaysUnderWay, type StylistReplan } from '../planning';
import { findSalon } from '../salon';
import { readConflictSittings } from './conflict-sittings.repository';
import { describeReplans } from './conflict-words';

/** The re-plans in the desk's words, with the names they need read once. */
export async function summarise(db: Db, salon: Salon, replans: StylistReplan[]): Promise<ReplanSummary> {
  const ids = replans.flatMap((r) => r.conflicts.flatMap((c) => [c.sittingId, ...(c.causeId ? [c.causeId] : []), ...c.fixes.map((f) => f.fix.sittingId)]));
  const [sittings, chairs, basins, stylists, told] = await Promise.all([
    readConflictSittings(db, salon.id, ids),
    listChairs(db, salon.id),
    listBasins(db, salon.id),
    listStylists(db, salon.id),
    runningLateTold(db, [...new Set(replans.flatMap((r) => r.conflicts.map((c) => c.sittingId)))]),
  ]);
  const byId = (rows: Array<{ id: string; name: string }>) => new Map(rows.map((r) => [r.id, r.name]));
  return describeReplans(replans, {
    timeZone: salon.timeZone,
    granularityMinutes: salon.granularityMinutes,
    sittings,
    chairs: byId(chairs),
    basins: byId(basins),
    stylists: byId(stylists),
    told,
  });
}

/** The moment of a re-plan, to the second. */
const asOf = (now: Date, zone: string) => instantIso(new Date(Math.floor(now.getTime() / 1000) * 1000), zone);

/**
 * When the re-plans next change with the clock alone: a minute after the earliest expected end of a running step. The
 * engine reads now to the minute and a running step lasts until the grid point at or after it, so the step starts to
 * push what follows once now's minute is past that end. Screens read the day again then, so an overrun nobody taps
 * shows within seconds.
 */
function recheckAt(replans: StylistReplan[], zone: string): string | null {
  const ends = replans.flatMap((r) => r.sittings.flatMap((s) => s.steps.filter((st) => st.state === 'running').map((st) => Date.parse(st.end))));
  return ends.length ? instantIso(new Date(Math.min(...ends) + 60_000), zone) : null;
}

/** Every day under way at `now` re-planned and put in words, as the desk's "Running late" panel reads it. */
export async function salonDayNow(db: Db, salon: Salon, now: Date): Promise<DayConflicts> {
  const replans = await replanDaysUnderWay(db, salon, now);
  const summary = await summarise(db, salon, replans);
  return {
    date: localDateOf(now, salon.timeZone),
    timeZone: salon.timeZone,
    asOf: asOf(now, salon.timeZone),
    recheckAt: recheckAt(replans, salon.timeZone),
    ...summary,
  };
}

/** The signed-in stylist's day as it now runs (My day's times): today's sittings not finished yet, re-planned from the actual times. */
export async function stylistDayRun(db: Db, user: SessionUser, date: string | undefined, now: Date): Promise<StylistDayRun> {
  const salon = await findSalon(db, user.salonId);
  const today = localDateOf(now, salon.timeZone);
  const base = { date: date ?? today, timeZone: salon.timeZone, asOf: asOf(now, salon.timeZone) };
  if (date && date !== today) return { ...base, recheckAt: null, sittings: [] };
  const staffId = await findStaffIdForUser(db, user.id);
  if (!staffId) throw new AppError('NOT_FOUND', 404, 'No stylist profile is linked to this account.');
  const replan = await replanDayFor(db, salon, staffId, now);
  const open = (replan?.sittings ?? []).filter((s) => s.steps.some((st) => st.state !== 'finished'));
  const rows = await readConflictSittings(
    db,
    salon.id,
    open.map((s) => s.sittingId),
  );
  return {
    ...base,
    recheckAt: recheckAt(replan ? [replan] : [], salon.timeZone),
    // An open sitting keeps every step of the book, in its order: step k is at index k − 1.
    sittings: open.flatMap((s) => {
      const row = rows.get(s.sittingId);
      return row ? [{ bookingId: row.bookingId, seq: row.seq, moved: s.moved, steps: s.steps.map(({ start, end, state }) => ({ start, end, state })) }] : [];
    }),
  };
}

/** The desk's conflicts for a date: today's re-planned from the actual times; any other day runs as booked, so none. */
export async function deskDayConflicts(db: Db, user: SessionUser, date: string | undefined, now: Date): Promise<DayConflicts> {
  const salon = await findSalon(db, user.salonId);
  const today = localDateOf(now, salon.timeZone);
  if (date && date !== today) return { date, timeZone: salon.timeZone, asOf: asOf(now, salon.timeZone), recheckAt: null, conflicts: [], freed: [] };
  return salonDayNow(db, salon, now);
}

/** What a tap on a sitting means for its stylist's day at `now` (the answer beside the sitting). */
export async function replanAfterTap(db: Db, salon: Salon, stylistId: string, now: Date): Promise<ReplanSummary> {
  const replan = await replanDayFor(db, salon, stylistId, now);
  return replan ? summarise(db, salon, [replan]) : { conflicts: [], freed: [] };
}
