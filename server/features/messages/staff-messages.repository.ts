import { sql } from 'kysely';
import type { Db } from '@server/db/database';

export interface SalonClock {
  id: string;
  name: string;
  timeZone: string;
  currency: string;
}

export async function salonsForStaffMessages(db: Db): Promise<SalonClock[]> {
  return db.selectFrom('salons').select(['id', 'name', 'time_zone as timeZone', 'currency']).execute();
}

export interface DaySitting {
  staffId: string;
  stylistName: string;
  stylistEmail: string | null;
  start: Date;
  end: Date;
  seq: number;
  sittingCount: number;
  clientName: string;
  serviceName: string;
  bookingId: string;
  depositDue: number;
  depositPaid: boolean;
}

/** Every live sitting starting in [from, to) at the salon, with who does it and whether its deposit is paid. */
export async function sittingsBetween(db: Db, salonId: string, from: Date, to: Date): Promise<DaySitting[]> {
  return db
    .selectFrom('sittings as s')
    .innerJoin('bookings as b', 'b.id', 's.booking_id')
    .innerJoin('staff as st', 'st.id', 'b.stylist_id')
    .leftJoin('users as u', 'u.id', 'st.user_id')
    .innerJoin('services as sv', 'sv.id', 'b.service_id')
    .leftJoin('clients as c', 'c.id', 'b.client_id')
    .select([
      'st.id as staffId',
      'st.display_name as stylistName',
      'u.email as stylistEmail',
      's.seq',
      'b.id as bookingId',
      'sv.name as serviceName',
      sql<Date>`lower(s.during)`.as('start'),
      sql<Date>`upper(s.during)`.as('end'),
      sql<number>`(select count(*)::int from sittings x where x.booking_id = b.id)`.as('sittingCount'),
      sql<string>`coalesce(c.name, 'Walk-in')`.as('clientName'),
      sql<number>`greatest(b.deposit_cents, sv.deposit_cents)`.as('depositDue'),
      sql<boolean>`exists (select 1 from payments p where p.booking_id = b.id and p.kind = 'deposit' and p.status = 'succeeded')`.as('depositPaid'),
    ])
    .where('b.salon_id', '=', salonId)
    .where('b.status', 'in', ['booked', 'checked_in'])
    .where(sql<boolean>`lower(s.during) >= ${from} and lower(s.during) < ${to}`)
    .orderBy(sql`lower(s.during)`)
    .execute();
}

/** Where the desk's lists go: front-desk users, or the owner when the salon has no desk account. */
export async function deskEmails(db: Db, salonId: string): Promise<string[]> {
  const rows = await db
    .selectFrom('users')
    .select(['email', 'role'])
    .where('salon_id', '=', salonId)
    .where('active', '=', true)
    .where('role', 'in', ['front_desk', 'owner'])
    .execute();
  const desk = rows.filter((r) => r.role === 'front_desk');
  return (desk.length > 0 ? desk : rows).map((r) => r.email);
}
