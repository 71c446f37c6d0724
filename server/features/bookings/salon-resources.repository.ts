import type { Db } from '@server/db/database';

export function listStylists(db: Db, salonId: string) {
  return db
    .selectFrom('staff')
    .select(['id', 'display_name as name', 'skills'])
    .where('salon_id', '=', salonId)
    .where('active', '=', true)
    .orderBy('display_name')
    .execute();
}

export function listChairs(db: Db, salonId: string) {
  return db.selectFrom('chairs').select(['id', 'name']).where('salon_id', '=', salonId).where('active', '=', true).orderBy('name').execute();
}

export async function findStaffIdForUser(db: Db, userId: string): Promise<string | undefined> {
  const row = await db.selectFrom('staff').select('id').where('user_id', '=', userId).executeTakeFirst();
  return row?.id;
}

export function listBasins(db: Db, salonId: string) {
  return db.selectFrom('basins').select(['id', 'name']).where('salon_id', '=', salonId).where('active', '=', true).orderBy('name').execute();
}
