import { sql, type Kysely } from 'kysely';

// The deposit a service asks for when booked; copied onto each booking (the salon's policy may change later).
export async function up(db: Kysely<any>): Promise<void> {
  await sql`alter table services add column deposit_cents integer not null default 0 check (deposit_cents >= 0)`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`alter table services drop column deposit_cents`.execute(db);
}
