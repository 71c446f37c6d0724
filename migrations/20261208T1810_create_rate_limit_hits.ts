import { sql, type Kysely } from 'kysely';

// Per-address (and per-person) request limits are counted here, so they hold across every app server instead of
// multiplying by the number of servers. One row per limit and caller: hits in the current window and when it ends.
// Unlogged: faster to write, and after a crash the counts simply start again.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create unlogged table rate_limit_hits (
      key text primary key,
      hits integer not null,
      reset_at timestamptz not null
    );
    create index rate_limit_hits_reset_at on rate_limit_hits (reset_at);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table rate_limit_hits;`.execute(db);
}
