import { sql, type Kysely } from 'kysely';

// Who changed what and when, with the record before and after; shown on a booking's history.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table audit_log (
      id bigint generated always as identity primary key,
      salon_id uuid not null references salons(id) on delete cascade,
      actor_user_id uuid references users(id) on delete set null,
      entity text not null,
      entity_id uuid not null,
      action text not null,
      before jsonb,
      after jsonb,
      at timestamptz not null default now()
    );
    create index audit_log_entity on audit_log(entity, entity_id);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table audit_log;`.execute(db);
}
