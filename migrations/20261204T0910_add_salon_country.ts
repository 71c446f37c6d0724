import { sql, type Kysely } from 'kysely';

// The salon's country (ISO 3166-1 alpha-2): phone numbers typed without a country code are read as its.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`alter table salons add column country text not null default 'US' check (country ~ '^[A-Z]{2}$')`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`alter table salons drop column country`.execute(db);
}
