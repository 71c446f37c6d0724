import { sql, type Kysely } from 'kysely';

// Skin (allergy alert) tests gate oxidative colour: a negative result read at least the salon's lead time
// before the colour, and not older than the salon's validity period.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table skin_tests (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      client_id uuid not null references clients(id) on delete cascade,
      applied_at timestamptz not null,
      read_at timestamptz,
      product text not null default '',
      result text not null check (result in ('pending', 'negative', 'positive', 'unclear')),
      recorded_by uuid references users(id) on delete set null,
      notes text not null default '',
      created_at timestamptz not null default now(),
      check (read_at is null or read_at >= applied_at),
      check ((result = 'pending') = (read_at is null))
    );
    create index skin_tests_client on skin_tests(client_id, applied_at desc);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table skin_tests;`.execute(db);
}
