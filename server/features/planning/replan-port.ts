/**
 * The planning port's re-plan: a stylist's day (or every day under way) re-planned by the engine from the actual step
 * times, read from the book the way the port's other questions read it (the salon's setup once, the book of the day
 * and the next once), answered in sitting and step ids.
 */
import type { Db } from '@server/db/database';
import { replanDay } from '@shared/engine/engine';
import type { Salon } from '@shared/schemas/salon.schemas';
import { instantAt, localDateOf, shiftLocalDate } from '@shared/time/salon-time';
import { readDayRuns } from './day-runs.repository';
import { followTheRun, fromAnswer, replanAsk, sittingsKeptWithStylist, stylistsUnderWay, type StylistReplan } from './replan-ask';
import { calendarsOf, loadSalonBook, loadSalonSetup } from './salon-calendars.repository';

/** What a re-plan needs of the salon row. */
export type ReplanSalon = Pick<Salon, 'id' | 'timeZone' | 'granularityMinutes' | 'lateStartLimitMinutes'>;

/**
 * The day of `now` re-planned for one stylist, or for every stylist with a sitting under way or run that day
 * (`'under_way'`). The engine reads the day and the next (a sitting pushed past midnight meets the next day's first
 * clients); stylists no longer active are left out.
 */
async function replanDays(db: Db, salon: ReplanSalon, now: Date, who: { stylistId: string } | 'under_way'): Promise<StylistReplan[]> {
  const date = localDateOf(now, salon.timeZone);
  const horizon = { from: date, to: shiftLocalDate(date, 2) };
  const dayStart = instantAt(date, salon.timeZone)!; // a date read from an instant is a real date
  const dayEnd = instantAt(shiftLocalDate(date, 1), salon.timeZone)!;
  const stylistId = who === 'under_way' ? undefined : who.stylistId;
  // One round of reads: the book starts at once and its time off follows the setup's stylists.
  const reading = loadSalonSetup(db, salon.id);
  const [setup, book, runs] = await Promise.all([reading, loadSalonBook(db, salon, reading, horizon), readDayRuns(db, salon.id, dayStart, dayEnd, stylistId)]);
  const active = new Set(setup.stylists.map((s) => s.id));
  const stylists = (who === 'under_way' ? stylistsUnderWay(runs) : [who.stylistId]).filter((id) => active.has(id));
  if (stylists.length === 0) return [];
  const asRun = followTheRun(book, runs);
  const scenario = calendarsOf(salon, setup, { ...book, ...asRun });
  const kept = sittingsKeptWithStylist(runs);
  return stylists.map((id) =>
    fromAnswer(replanDay(scenario, replanAsk(id, now, salon.timeZone, salon.lateStartLimitMinutes, runs, asRun)), asRun.stepIds, kept),
  );
}

/** One stylist's day at `now` re-planned from the actual times: conflicts with fixes best first, and the time freed. */
export async function replanDayFor(db: Db, salon: ReplanSalon, stylistId: string, now: Date): Promise<StylistReplan | null> {
  const [answer] = await replanDays(db, salon, now, { stylistId });
  return answer ?? null;
}

/** Every stylist's day at `now` that has a sitting under way or run, re-planned from one read of the book. */
export function replanDaysUnderWay(db: Db, salon: ReplanSalon, now: Date): Promise<StylistReplan[]> {
  return replanDays(db, salon, now, 'under_way');
}
