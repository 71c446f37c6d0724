import { sql } from 'kysely';
import type { Db } from '@server/db/database';

export interface SalonCounts {
  stylists: number;
  chairs: number;
  basins: number;
  services: number;
  clients: number;
}

/** How many stylists (rows of staff), chairs, basins, services and clients the salon has. */
export async function salonCounts(db: Db, salonId: string): Promise<SalonCounts> {
  const count = async (table: 'staff' | 'chairs' | 'basins' | 'services' | 'clients') =>
    (
      await db
        .selectFrom(table)
        .select(sql<number>`count(*)::int`.as('n'))
        .where('salon_id', '=', salonId)
        .executeTakeFirstOrThrow()
    ).n;
  const [stylists, chairs, basins, services, clients] = await Promise.all([
    count('staff'),
    count('chairs'),
    count('basins'),
    count('services'),
    count('clients'),
  ]);
  return { stylists, chairs, basins, services, clients };
}

/** Bookings with a live sitting in [from, to); holds are left out (a few minutes' keep while someone pays, not work). */
export async function bookingsBetween(db: Db, salonId: string, from: Date, to: Date): Promise<number> {
  const row = await db
    .selectFrom('bookings as b')
    .select(sql<number>`count(distinct b.id)::int`.as('n'))
    .innerJoin('sittings as s', 's.booking_id', 'b.id')
    .where('b.salon_id', '=', salonId)
    .where('s.live', '=', true)
    .where('b.status', '!=', 'held')
    .where(sql<boolean>`s.during && tstzrange(${from}, ${to})`)
    .executeTakeFirstOrThrow();
  return row.n;
}
