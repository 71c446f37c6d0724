import { sql } from 'kysely';
import { DateTime } from 'luxon';
import type { Db } from '../../db/database';
import type { OwnerOverview } from '../../../shared/schemas/owner.schemas';
import type { Salon } from '../../../shared/schemas/salon.schemas';
import { occupancyOver } from '../planning/planning-port';
import { listStylists } from '../bookings/salon-resources.repository';

/** Counts of what the salon has, and the current week (Monday to Sunday, salon time). */
export async function ownerOverview(db: Db, salon: Salon, now: Date): Promise<OwnerOverview> {
  const weekStart = DateTime.fromJSDate(now, { zone: salon.timeZone }).startOf('week');
  const from = weekStart.toISODate()!;
  const to = weekStart.plus({ days: 7 }).toISODate()!;
  const count = (table: 'staff' | 'chairs' | 'basins' | 'services' | 'clients') =>
    db.selectFrom(table).select(sql<number>`count(*)::int`.as('n')).where('salon_id', '=', salon.id).executeTakeFirstOrThrow();
  const [stylists, chairs, basins, services, clients, bookings, [measured], staff] = await Promise.all([
    count('staff'),
    count('chairs'),
    count('basins'),
    count('services'),
    count('clients'),
    db
      .selectFrom('bookings as b')
      .select(sql<number>`count(distinct b.id)::int`.as('n'))
      .innerJoin('sittings as s', 's.booking_id', 'b.id')
      .where('b.salon_id', '=', salon.id)
      .where('s.live', '=', true)
      .where('b.status', '!=', 'held') // a hold is a few minutes' keep while someone pays, not work
      .where(sql<boolean>`s.during && tstzrange(${weekStart.toJSDate()}, ${weekStart.plus({ days: 7 }).toJSDate()})`)
      .executeTakeFirstOrThrow(),
    occupancyOver(db, salon, [{ horizon: { from, to }, cuts: [] }]),
    listStylists(db, salon.id),
  ]);
  // The same occupancy computation as `npm run plan -- occupancy` on this week's calendars.
  const usage = measured.answer;
  return {
    salon,
    counts: { stylists: stylists.n, chairs: chairs.n, basins: basins.n, services: services.n, clients: clients.n },
    week: {
      from,
      to,
      bookings: bookings.n,
      chairOccupancy: usage.chairOccupancy,
      windowUse: usage.windowUse,
      handsOnShare: staff.map((s) => ({ stylist: s.name, share: usage.handsOnShare[s.id] ?? null })),
    },
  };
}
