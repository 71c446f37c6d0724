import { sql, type Kysely } from 'kysely';
import PgBoss from 'pg-boss';

// The job queue's own tables (pg-boss), created with the schema so the app never migrates at start-up.
export async function up(db: Kysely<any>): Promise<void> {
  await sql.raw(PgBoss.getConstructionPlans('pgboss')).execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop schema pgboss cascade`.execute(db);
}
