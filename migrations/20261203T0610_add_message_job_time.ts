import { sql, type Kysely } from 'kysely';

// due_at: when a message was first due, kept while retries move send_at, so messages held up by a provider
// outage still go out in their planned order.
// job_at: the send_at a pg-boss job was queued for (startAfter = that instant). A row whose send_at moved
// (a retry's backoff) differs from it and gets a new job; the claim still decides who sends, so a stale
// job finds nothing to do.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`alter table messages add column job_at timestamptz, add column due_at timestamptz;`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`alter table messages drop column job_at, drop column due_at;`.execute(db);
}
