import { sql, type Kysely } from 'kysely';

// A booking is "checked out" once its checkout is paid: the visit is over and settled. It follows "finished" (or
// "checked in", when the client pays before the stylist taps the last step) and no tap moves it back.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table bookings drop constraint bookings_status_check;
    alter table bookings add constraint bookings_status_check
      check (status in ('held', 'booked', 'checked_in', 'finished', 'checked_out', 'cancelled', 'no_show'));
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    update bookings set status = 'finished' where status = 'checked_out';
    alter table bookings drop constraint bookings_status_check;
    alter table bookings add constraint bookings_status_check
      check (status in ('held', 'booked', 'checked_in', 'finished', 'cancelled', 'no_show'));
  `.execute(db);
}
