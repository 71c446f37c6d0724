import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { DayConflicts, ReplanSummary } from '@shared/schemas/replan.schemas';
import type { Salon } from '@shared/schemas/salon.schemas';
import { instantIso, localDateOf } from '@shared/time/salon-time';
import { listBasins, listChairs, listStylists } from '../bookings';
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

/** Every day under way at `now` re-planned and put in words, as the desk's "Running late" panel reads it. */
export async function salonDayNow(db: Db, salon: Salon, now: Date): Promise<DayConflicts> {
  const summary = await summarise(db, salon, await replanDaysUnderWay(db, salon, now));
  return { date: localDateOf(now, salon.timeZone), timeZone: salon.timeZone, asOf: asOf(now, salon.timeZone), ...summary };
}

/** The desk's conflicts for a date: today's re-planned from the actual times; any other day runs as booked, so none. */
export async function deskDayConflicts(db: Db, user: SessionUser, date: string | undefined, now: Date): Promise<DayConflicts> {
  const salon = await findSalon(db, user.salonId);
  const today = localDateOf(now, salon.timeZone);
  if (date && date !== today) return { date, timeZone: salon.timeZone, asOf: asOf(now, salon.timeZone), conflicts: [], freed: [] };
  return salonDayNow(db, salon, now);
}

/** What a tap on a sitting means for its stylist's day at `now` (the answer beside the sitting). */
export async function replanAfterTap(db: Db, salon: Salon, stylistId: string, now: Date): Promise<ReplanSummary> {
  const replan = await replanDayFor(db, salon, stylistId, now);
  return replan ? summarise(db, salon, [replan]) : { conflicts: [], freed: [] };
}
