import type { Db } from '@server/db/database';
import type { Salon } from '@shared/schemas/salon.schemas';
import { notFound } from '@server/lib/app-error';
import { toSalon } from '../salon';

/** A salon as its public page and online booking find it: by the slug in its address, with its hold minutes. */
export async function findSalonBySlug(db: Db, slug: string): Promise<Salon & { holdMinutes: number }> {
  const row = await db.selectFrom('salons').selectAll().where('slug', '=', slug).executeTakeFirst();
  if (!row) throw notFound('That salon');
  return { ...toSalon(row), holdMinutes: row.hold_minutes };
}
