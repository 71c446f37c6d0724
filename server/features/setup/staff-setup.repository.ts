import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { StaffDetails, StaffMember } from '@shared/schemas/setup.schemas';
import { tstzRange } from '../bookings';
import { deleteSessionsOfUser } from '../password-reset';

/** Stored as the password hash of an invited account: no password verifies against it. */
export const INVITED_HASH = 'invited: no password yet';

const hhmm = (t: string) => t.slice(0, 5);

/** Everyone who works at the salon (not clients), with stylist details where they take clients. */
export async function listStaff(db: Db, salonId: string, now: Date): Promise<StaffMember[]> {
  const people = await db
    .selectFrom('users as u')
    .leftJoin('staff as s', 's.user_id', 'u.id')
    .select([
      'u.id',
      'u.email',
      'u.name',
      'u.role',
      'u.active',
      'u.password_hash',
      's.id as staffId',
      's.skills',
      's.max_clients_at_once',
      's.active as staffActive',
    ])
    .select((eb) =>
      eb
        .selectFrom('bookings as b')
        .innerJoin('sittings as si', 'si.booking_id', 'b.id')
        .select(sql<number>`count(distinct b.id)::int`.as('n'))
        .whereRef('b.stylist_id', '=', 's.id')
        .where('b.status', 'in', ['held', 'booked', 'checked_in'])
        .where('si.live', '=', true)
        .where(sql<boolean>`upper(si.during) > ${now}`)
        .as('futureBookings'),
    )
    .where('u.salon_id', '=', salonId)
    .where('u.role', '!=', 'client')
    .orderBy('u.active', 'desc')
    .orderBy('u.name')
    .execute();
  const staffIds = people.flatMap((p) => (p.staffId ? [p.staffId] : []));
  const [hours, timeOff] = staffIds.length
    ? await Promise.all([
        db.selectFrom('staff_hours').select(['staff_id', 'rrule', 'start_time', 'end_time']).where('staff_id', 'in', staffIds).orderBy('start_time').execute(),
        db
          .selectFrom('time_off')
          .select(['id', 'staff_id', 'reason', sql<Date>`lower(during)`.as('start'), sql<Date>`upper(during)`.as('end')])
          .where('staff_id', 'in', staffIds)
          .where(sql<boolean>`upper(during) > ${now}`)
          .orderBy('during')
          .execute(),
      ])
    : [[], []];
  return people.map((p) => ({
    id: p.id,
    staffId: p.staffId,
    email: p.email,
    active: p.active && p.staffActive !== false,
    invited: p.password_hash === INVITED_HASH,
    details: {
      name: p.name,
      role: p.role as StaffDetails['role'],
      skills: p.skills ?? [],
      maxClientsAtOnce: p.max_clients_at_once ?? 1,
      hours: hours.filter((h) => h.staff_id === p.staffId).map((h) => ({ rrule: h.rrule, start: hhmm(h.start_time), end: hhmm(h.end_time) })),
    },
    timeOff: timeOff
      .filter((t) => t.staff_id === p.staffId)
      .map((t) => ({ id: t.id, start: t.start.toISOString(), end: t.end.toISOString(), reason: t.reason })),
    futureBookings: p.futureBookings ?? 0,
  }));
}

export async function insertInvitedUser(db: Db, salonId: string, email: string, details: StaffDetails): Promise<string> {
  const row = await db
    .insertInto('users')
    .values({ salon_id: salonId, email, name: details.name, role: details.role, phone: null, password_hash: INVITED_HASH })
    .returning('id')
    .executeTakeFirstOrThrow();
  await writeStaffDetails(db, salonId, row.id, details);
  return row.id;
}

/** Name and role on the account; skills, cap and working hours on the staff row of someone who takes clients. */
export async function writeStaffDetails(db: Db, salonId: string, userId: string, details: StaffDetails): Promise<void> {
  await db.updateTable('users').set({ name: details.name, role: details.role }).where('id', '=', userId).where('salon_id', '=', salonId).execute();
  let staff = await db.selectFrom('staff').select('id').where('user_id', '=', userId).executeTakeFirst();
  if (!staff && details.role !== 'stylist') return;
  if (!staff) {
    staff = await db
      .insertInto('staff')
      .values({ salon_id: salonId, user_id: userId, display_name: details.name, skills: details.skills, max_clients_at_once: details.maxClientsAtOnce })
      .returning('id')
      .executeTakeFirstOrThrow();
  } else {
    await db
      .updateTable('staff')
      .set({ display_name: details.name, skills: details.skills, max_clients_at_once: details.maxClientsAtOnce })
      .where('id', '=', staff.id)
      .execute();
  }
  await db.deleteFrom('staff_hours').where('staff_id', '=', staff.id).execute();
  if (details.hours.length > 0) {
    await db
      .insertInto('staff_hours')
      .values(details.hours.map((h) => ({ staff_id: staff.id, rrule: h.rrule, start_time: h.start, end_time: h.end })))
      .execute();
  }
}

export async function findStaffUser(db: Db, salonId: string, userId: string) {
  return db
    .selectFrom('users as u')
    .leftJoin('staff as s', 's.user_id', 'u.id')
    .select(['u.id', 'u.email', 'u.name', 'u.role', 's.id as staffId'])
    .where('u.id', '=', userId)
    .where('u.salon_id', '=', salonId)
    .where('u.role', '!=', 'client')
    .executeTakeFirst();
}

export async function insertTimeOff(db: Db, staffId: string, from: Date, to: Date, reason: string): Promise<void> {
  await db
    .insertInto('time_off')
    .values({ staff_id: staffId, during: tstzRange(from, to), reason })
    .execute();
}

export async function deleteTimeOff(db: Db, staffId: string, id: string): Promise<boolean> {
  const r = await db.deleteFrom('time_off').where('id', '=', id).where('staff_id', '=', staffId).executeTakeFirst();
  return r.numDeletedRows > 0n;
}

/** Moves a whole booking (every live step) to another stylist; the hands constraint still has the last word. */
export async function reassignBooking(db: Db, salonId: string, bookingId: string, toStaffId: string): Promise<void> {
  await db.updateTable('bookings').set({ stylist_id: toStaffId }).where('id', '=', bookingId).where('salon_id', '=', salonId).execute();
  await db
    .updateTable('booking_steps')
    .set({ stylist_id: toStaffId })
    .where('sitting_id', 'in', (eb) => eb.selectFrom('sittings').select('id').where('booking_id', '=', bookingId))
    .execute();
}

export async function deactivateStaff(db: Db, userId: string, staffId: string | null): Promise<void> {
  await db.updateTable('users').set({ active: false }).where('id', '=', userId).execute();
  if (staffId) await db.updateTable('staff').set({ active: false }).where('id', '=', staffId).execute();
  await deleteSessionsOfUser(db, userId); // signed-in sessions end with the account
}

/** Every stylist's display name by staff id, former stylists too (for records that name who did the work). */
export async function salonStaffNames(db: Db, salonId: string): Promise<Map<string, string>> {
  const rows = await db.selectFrom('staff').select(['id', 'display_name']).where('salon_id', '=', salonId).execute();
  return new Map(rows.map((r) => [r.id, r.display_name]));
}
