import { sql } from 'kysely';
import type { Db } from '@server/db/database';

export interface FutureBooking {
  id: string;
  clientName: string;
  serviceName: string;
  skill: string;
  stylistId: string;
  stylistName: string;
  start: Date;
}

export type FutureFilter =
  { stylistId: string } | { serviceId: string } | { chairId: string; during: [Date, Date] } | { basinId: string; during: [Date, Date] };

/** Live bookings (held, booked, checked in) with a sitting still to come that the filter touches. */
export async function listFutureBookings(db: Db, salonId: string, filter: FutureFilter, now: Date): Promise<FutureBooking[]> {
  let query = db
    .selectFrom('bookings as b')
    .innerJoin('sittings as si', 'si.booking_id', 'b.id')
    .innerJoin('services as sv', 'sv.id', 'b.service_id')
    .innerJoin('staff as st', 'st.id', 'b.stylist_id')
    .leftJoin('clients as c', 'c.id', 'b.client_id')
    .select(['b.id', 'sv.name as serviceName', 'sv.skill', 'b.stylist_id as stylistId', 'st.display_name as stylistName'])
    .select([sql<string>`coalesce(c.name, 'Unclaimed hold')`.as('clientName'), sql<Date>`min(lower(si.during))`.as('start')])
    .where('b.salon_id', '=', salonId)
    .where('b.status', 'in', ['held', 'booked', 'checked_in'])
    .where('si.live', '=', true)
    .where(sql<boolean>`upper(si.during) > ${now}`)
    .groupBy(['b.id', 'sv.name', 'sv.skill', 'st.display_name', 'c.name'])
    .orderBy('start');
  if ('stylistId' in filter) query = query.where('b.stylist_id', '=', filter.stylistId);
  if ('serviceId' in filter) query = query.where('b.service_id', '=', filter.serviceId);
  if ('chairId' in filter) {
    query = query.where('si.chair_id', '=', filter.chairId).where(sql<boolean>`si.during && tstzrange(${filter.during[0]}, ${filter.during[1]})`);
  }
  if ('basinId' in filter) {
    const [from, to] = filter.during;
    query = query.where(({ exists, selectFrom }) =>
      exists(
        selectFrom('booking_steps as bs')
          .select('bs.id')
          .whereRef('bs.sitting_id', '=', 'si.id')
          .where('bs.basin_id', '=', filter.basinId)
          .where('bs.live', '=', true)
          .where(sql<boolean>`bs.during && tstzrange(${from}, ${to})`),
      ),
    );
  }
  return query.execute();
}

/** Future live sitting ids of a booking, for leaving them out of (or picking them from) the calendars. */
export async function futureSittingIds(db: Db, bookingId: string, now: Date): Promise<{ id: string; start: Date; end: Date }[]> {
  return db
    .selectFrom('sittings')
    .select(['id', sql<Date>`lower(during)`.as('start'), sql<Date>`upper(during)`.as('end')])
    .where('booking_id', '=', bookingId)
    .where('live', '=', true)
    .where(sql<boolean>`upper(during) > ${now}`)
    .orderBy('seq')
    .execute();
}
