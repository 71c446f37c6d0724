import { sql, type Kysely } from 'kysely';

// How late a later client may be asked to start when an earlier sitting overruns: the re-plan offers a late start
// up to this many minutes (15 by default, common practice for a salon's late-start allowance) before it offers
// another day. Set in Set-up → Salon beside the no-show grace.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table salons
      add column late_start_limit_minutes integer not null default 15 check (late_start_limit_minutes between 0 and 240);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`alter table salons drop column late_start_limit_minutes;`.execute(db);
}
