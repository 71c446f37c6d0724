import { sql, type Kysely } from 'kysely';

// Owner-edited marketing follow-ups per service (e.g. a toner refresh suggestion six weeks after lightening):
// an RRULE anchored on the end of the booking's last sitting. `version` goes into each planned message's
// dedupe key, so editing a rule drops what was queued and plans the new times under new keys.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table follow_up_rules (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      service_id uuid not null references services(id) on delete cascade,
      title text not null check (length(title) between 1 and 120),
      body text not null check (length(body) between 1 and 600),
      rrule text not null,
      version integer not null default 1,
      created_at timestamptz not null default now()
    );
    create index follow_up_rules_service on follow_up_rules(service_id);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table follow_up_rules;`.execute(db);
}
