import { sql, type Kysely } from 'kysely';

// Cancellation policy: inside the window before the first sitting the deposit is kept; earlier it is refunded.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table salons add column cancellation_window_hours integer not null default 48 check (cancellation_window_hours between 0 and 720);
    alter table bookings add column deposit_outcome text check (deposit_outcome in ('kept', 'refunded'));
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`alter table bookings drop column deposit_outcome; alter table salons drop column cancellation_window_hours;`.execute(db);
}
