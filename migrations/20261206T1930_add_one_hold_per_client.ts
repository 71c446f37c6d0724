import { sql, type Kysely } from 'kysely';

// One unpaid hold per client at a time: starting the online flow again goes back to the hold the client has
// (or releases it) instead of keeping a second time from other clients. Holds past their time are removed first
// (the lapse job would remove them anyway); of any client's holds still running, only the newest is kept, since
// the index cannot be built over two.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    delete from bookings where status = 'held' and held_until <= now();
    delete from bookings b
      where b.status = 'held' and b.client_id is not null
        and exists (select 1 from bookings n where n.client_id = b.client_id and n.status = 'held' and (n.created_at, n.id) > (b.created_at, b.id));
    create unique index bookings_one_hold_per_client on bookings(client_id) where status = 'held';
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop index bookings_one_hold_per_client;`.execute(db);
}
