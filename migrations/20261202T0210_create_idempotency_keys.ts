import { sql, type Kysely } from 'kysely';

// A retried booking request (same key from the same user) answers the first result instead of booking twice.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table idempotency_keys (
      user_id uuid not null references users(id) on delete cascade,
      key text not null,
      route text not null,
      status integer not null,
      response jsonb not null,
      created_at timestamptz not null default now(),
      primary key (user_id, key)
    );
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table idempotency_keys;`.execute(db);
}
