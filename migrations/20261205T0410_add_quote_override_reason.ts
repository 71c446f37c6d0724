import { sql, type Kysely } from 'kysely';

// A quote that plans lightener or colour remover after a failed strand test keeps the stylist's written reason
// (empty when none was needed).
export async function up(db: Kysely<any>): Promise<void> {
  await sql`alter table quotes add column override_reason text not null default ''`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`alter table quotes drop column override_reason`.execute(db);
}
