import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { Salon } from '@shared/schemas/salon.schemas';
import { notFound } from '@server/lib/app-error';
import { toSalon } from '../salon';
import { shiftLocalDate } from '@shared/time/salon-time';

/** Local dates [from, to) in the salon's zone, YYYY-MM-DD. */
export interface DayRange {
  from: string;
  to: string;
}

/** `count` local dates from `date` (YYYY-MM-DD), as the range the book's date versions are read for. */
export function daysFrom(date: string, count: number): DayRange {
  return { from: date, to: shiftLocalDate(date, count) };
}

type SalonKey = { id: string } | { slug: string };

/**
 * The salon's row and the version of its book over some dates (moved by triggers with every change a
 * calendar read or free-time search over those dates depends on; see migrations/20261204T0900), read in
 * one statement so they agree. Read them before the data they guard: an answer computed afterwards reflects
 * that version or a newer one, never an older one, so caching it under the version is safe, whichever app
 * server made the change. `days` may depend on the salon's zone (today, or a search from now): it is then
 * asked with the zone first.
 */
export async function salonAtBookVersion(db: Db, by: SalonKey, days: DayRange | ((timeZone: string) => DayRange)): Promise<{ salon: Salon; version: string }> {
  const range = typeof days === 'function' ? days(await zoneOf(db, by)) : days;
  const row = await db
    .selectFrom('salons as s')
    .leftJoin('book_versions as v', 'v.salon_id', 's.id')
    .selectAll('s')
    .select('v.version as salonVersion')
    .select((eb) =>
      eb
        .selectFrom('book_day_versions as d')
        .select(sql<string>`coalesce(sum(d.version), 0)::bigint`.as('n'))
        .whereRef('d.salon_id', '=', 's.id')
        .where('d.day', '>=', sql<Date>`${range.from}::date`)
        .where('d.day', '<', sql<Date>`${range.to}::date`)
        .as('dayVersions'),
    )
    .where(column(by), '=', value(by))
    .executeTakeFirst();
  if (!row) throw notFound('That salon');
  const { salonVersion, dayVersions, ...salon } = row;
  return { salon: toSalon(salon), version: String(BigInt(salonVersion ?? 0) + BigInt(dayVersions ?? 0)) };
}

const column = (by: SalonKey) => ('id' in by ? 's.id' : 's.slug') as 's.id';
const value = (by: SalonKey) => ('id' in by ? by.id : by.slug);

async function zoneOf(db: Db, by: SalonKey): Promise<string> {
  const row = await db.selectFrom('salons as s').select('s.time_zone').where(column(by), '=', value(by)).executeTakeFirst();
  if (!row) throw notFound('That salon');
  return row.time_zone;
}
