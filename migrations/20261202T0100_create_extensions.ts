import { sql, type Kysely } from 'kysely';

// btree_gist lets exclusion constraints combine "same resource" (=) with "overlapping time" (&&).
export async function up(db: Kysely<any>): Promise<void> {
  await sql`create extension if not exists btree_gist`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop extension if exists btree_gist`.execute(db);
}
