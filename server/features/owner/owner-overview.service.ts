import { DateTime } from 'luxon';
import type { Db } from '@server/db/database';
import type { OwnerOverview } from '@shared/schemas/owner.schemas';
import { occupancyOver } from '../planning';
import { listStylists } from '../bookings';
import { findSalon } from '../salon';
import { bookingsBetween, salonCounts } from './owner-overview.repository';

/** Counts of what the salon has, and the current week (Monday to Sunday, salon time). */
export async function ownerOverview(db: Db, salonId: string, now: Date): Promise<OwnerOverview> {
  const salon = await findSalon(db, salonId);
  const weekStart = DateTime.fromJSDate(now, { zone: salon.timeZone }).startOf('week');
  const from = weekStart.toISODate()!;
  const to = weekStart.plus({ days: 7 }).toISODate()!;
  const [counts, bookings, [measured], staff] = await Promise.all([
    salonCounts(db, salon.id),
    bookingsBetween(db, salon.id, weekStart.toJSDate(), weekStart.plus({ days: 7 }).toJSDate()),
    occupancyOver(db, salon, [{ horizon: { from, to }, cuts: [] }]),
    listStylists(db, salon.id),
  ]);
  // The same occupancy computation as `npm run plan -- occupancy` on this week's calendars.
  const usage = measured!.answer; // one breakdown per part asked for
  return {
    salon,
    counts,
    week: {
      from,
      to,
      bookings,
      chairOccupancy: usage.chairOccupancy,
      windowUse: usage.windowUse,
      handsOnShare: staff.map((s) => ({ stylist: s.name, share: usage.handsOnShare[s.id] ?? null })),
    },
  };
}
