import { sql, type Kysely } from 'kysely';

// Clients who asked to be called when an earlier time or a window fit opens up.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table standby_entries (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      client_id uuid not null references clients(id) on delete cascade,
      service_ids uuid[] not null check (cardinality(service_ids) >= 1),
      stylist_id uuid references staff(id) on delete set null,
      availability jsonb not null,
      notes text not null default '',
      active boolean not null default true,
      created_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now()
    );
    create index standby_entries_salon on standby_entries(salon_id) where active;
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table standby_entries;`.execute(db);
}
