import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { Unit, UnitKind } from '@shared/schemas/setup.schemas';
import { tstzRange } from '../bookings';

const idColumn = (kind: UnitKind) => (kind === 'chairs' ? 'chair_id' : 'basin_id');

/** Active chairs and basins, each with its out-of-service periods still to come. */
export async function listUnits(db: Db, salonId: string, now: Date): Promise<Record<UnitKind, Unit[]>> {
  const [chairs, basins, closures] = await Promise.all([
    db.selectFrom('chairs').select(['id', 'name']).where('salon_id', '=', salonId).where('active', '=', true).orderBy('name').execute(),
    db.selectFrom('basins').select(['id', 'name']).where('salon_id', '=', salonId).where('active', '=', true).orderBy('name').execute(),
    db
      .selectFrom('out_of_service')
      .select(['id', 'chair_id', 'basin_id', 'reason', sql<Date>`lower(during)`.as('start'), sql<Date>`upper(during)`.as('end')])
      .where('salon_id', '=', salonId)
      .where(sql<boolean>`upper(during) > ${now}`)
      .orderBy('during')
      .execute(),
  ]);
  const withClosures = (u: { id: string; name: string }): Unit => ({
    ...u,
    outOfService: closures
      .filter((c) => c.chair_id === u.id || c.basin_id === u.id)
      .map((c) => ({ id: c.id, start: c.start.toISOString(), end: c.end.toISOString(), reason: c.reason })),
  });
  return { chairs: chairs.map(withClosures), basins: basins.map(withClosures) };
}

export async function unitExists(db: Db, salonId: string, kind: UnitKind, id: string): Promise<boolean> {
  return Boolean(await db.selectFrom(kind).select('id').where('id', '=', id).where('salon_id', '=', salonId).where('active', '=', true).executeTakeFirst());
}

export async function insertUnit(db: Db, salonId: string, kind: UnitKind, name: string): Promise<string> {
  const row = await db.insertInto(kind).values({ salon_id: salonId, name }).returning('id').executeTakeFirstOrThrow();
  return row.id;
}

export async function renameUnit(db: Db, salonId: string, kind: UnitKind, id: string, name: string): Promise<void> {
  await db.updateTable(kind).set({ name }).where('id', '=', id).where('salon_id', '=', salonId).execute();
}

export async function insertOutOfService(db: Db, salonId: string, kind: UnitKind, id: string, from: Date, to: Date, reason: string): Promise<void> {
  await db
    .insertInto('out_of_service')
    .values({ salon_id: salonId, [idColumn(kind)]: id, during: tstzRange(from, to), reason })
    .execute();
}

export async function deleteOutOfService(db: Db, salonId: string, kind: UnitKind, unitId: string, id: string): Promise<boolean> {
  const r = await db.deleteFrom('out_of_service').where('id', '=', id).where('salon_id', '=', salonId).where(idColumn(kind), '=', unitId).executeTakeFirst();
  return r.numDeletedRows > 0n;
}
