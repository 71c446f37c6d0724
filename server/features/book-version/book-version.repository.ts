import type { Selectable } from 'kysely';
import type { Db } from '../../db/database';
import type { SalonsTable } from '../../db/schema';
import { notFound } from '../../lib/app-error';

/**
 * The salon's row and its book version (moved by triggers with every change a calendar read depends on;
 * see migrations/20261204T0900), read in one statement so they agree. Read them before the data they
 * guard: an answer computed afterwards reflects that version or a newer one, never an older one, so
 * caching it under the version is safe, whichever app server made the change.
 */
export async function salonAtBookVersion(db: Db, by: { id: string } | { slug: string }): Promise<{ salon: Selectable<SalonsTable>; version: string }> {
  const row = await db
    .selectFrom('salons as s')
    .leftJoin('book_versions as v', 'v.salon_id', 's.id')
    .selectAll('s')
    .select('v.version as bookVersion')
    .where('id' in by ? 's.id' : 's.slug', '=', 'id' in by ? by.id : by.slug)
    .executeTakeFirst();
  if (!row) throw notFound('That salon');
  const { bookVersion, ...salon } = row;
  return { salon, version: bookVersion ?? '0' };
}
