import type { Db } from '@server/db/database';

let seq = 0;

export interface SalonFixture {
  salonId: string;
  chairs: string[];
  basins: string[];
}

/** A salon with chairs and basins; valid by default, open Tue–Sat 09:00–21:00 in America/Denver. */
export async function insertSalon(db: Db, overrides: { chairs?: number; basins?: number; timeZone?: string } = {}): Promise<SalonFixture> {
  seq++;
  const { id: salonId } = await db
    .insertInto('salons')
    .values({ slug: `salon-${seq}-${Date.now()}`, name: `Test Salon ${seq}`, time_zone: overrides.timeZone ?? 'America/Denver', currency: 'USD' })
    .returning('id')
    .executeTakeFirstOrThrow();
  await db.insertInto('salon_hours').values({ salon_id: salonId, rrule: 'FREQ=WEEKLY;BYDAY=TU,WE,TH,FR,SA', start_time: '09:00', end_time: '21:00' }).execute();
  const names = (prefix: string, n: number) => [...Array(n).keys()].map((i) => ({ salon_id: salonId, name: `${prefix} ${i + 1}` }));
  const chairs = await db
    .insertInto('chairs')
    .values(names('Chair', overrides.chairs ?? 2))
    .returning('id')
    .execute();
  const basins = await db
    .insertInto('basins')
    .values(names('Basin', overrides.basins ?? 1))
    .returning('id')
    .execute();
  return { salonId, chairs: chairs.map((c) => c.id), basins: basins.map((b) => b.id) };
}
