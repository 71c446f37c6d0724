import type { Db } from '../../db/database';
import type { Names } from './engine-request';

/** Display names of a salon's stylists, chairs and basins, for turning engine ids into words. */
export async function loadNames(db: Db, salonId: string): Promise<Names> {
  const [stylists, chairs, basins] = await Promise.all([
    db.selectFrom('staff').select(['id', 'display_name as name']).where('salon_id', '=', salonId).execute(),
    db.selectFrom('chairs').select(['id', 'name']).where('salon_id', '=', salonId).execute(),
    db.selectFrom('basins').select(['id', 'name']).where('salon_id', '=', salonId).execute(),
  ]);
  const map = (rows: { id: string; name: string }[]) => new Map(rows.map((r) => [r.id, r.name]));
  return { stylists: map(stylists), chairs: map(chairs), basins: map(basins) };
}
