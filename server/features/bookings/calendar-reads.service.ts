import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { Db } from '@server/db/database';
import type { JsonText } from '@server/lib/json-text';
import type { ReadCache } from '@server/lib/read-cache';
import { daysFrom, salonAtBookVersion } from '../book-version';
import { cachedBookRead } from '../book-version';
import { deskDay, deskWeek, mondayOf, stylistDay, todayIn } from './day-view.service';

/*
 * The calendar reads the desk and stylists open all day, answered from the read cache while the book over their
 * dates stands still (see DEVELOPERS.md, "Cached reads and the book version"): each key names every parameter.
 */

/**
 * The salon at its book version over `count` dates from `date` (moved to the start of its period by
 * `start`, e.g. the week's Monday); without a date, from today in the salon's zone, which is asked first.
 */
async function bookOver(db: Db, salonId: string, date: string | undefined, count: number, start = (d: string) => d) {
  let first = date && start(date);
  const at = await salonAtBookVersion(db, { id: salonId }, first ? daysFrom(first, count) : (zone) => daysFrom((first = start(todayIn(zone))), count));
  return { at, first: first! };
}

/** The whole salon's book for one day (today without a date). */
export async function cachedDeskDay(db: Db, cache: ReadCache, user: SessionUser, day: string | undefined): Promise<JsonText> {
  const { at, first: date } = await bookOver(db, user.salonId, day, 1);
  return cachedBookRead(cache, at, `desk-day|${date}`, () => deskDay(db, at.salon, date));
}

/** The week holding `day` (this week without one), for one stylist or all. */
export async function cachedDeskWeek(db: Db, cache: ReadCache, user: SessionUser, day: string | undefined, stylistId: string | undefined): Promise<JsonText> {
  const { at, first: monday } = await bookOver(db, user.salonId, day, 7, mondayOf);
  return cachedBookRead(cache, at, `desk-week|${monday}|${stylistId ?? 'all'}`, () => deskWeek(db, at.salon, monday, stylistId));
}

/** The signed-in stylist's own day. */
export async function cachedStylistDay(db: Db, cache: ReadCache, user: SessionUser, day: string | undefined): Promise<JsonText> {
  const { at, first: date } = await bookOver(db, user.salonId, day, 1);
  return cachedBookRead(cache, at, `stylist-day|${user.id}|${date}`, () => stylistDay(db, at.salon, user.id, date));
}
