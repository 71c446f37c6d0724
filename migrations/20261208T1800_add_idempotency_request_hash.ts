import { sql, type Kysely } from 'kysely';

// An idempotency key answers a repeat of its own request only: the request's fingerprint is kept with the key, so
// the same key sent with another body is refused (422) instead of answering the first booking. Keys stored before
// have no fingerprint and are taken as matching.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`alter table idempotency_keys add column request_hash text`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`alter table idempotency_keys drop column request_hash`.execute(db);
}
