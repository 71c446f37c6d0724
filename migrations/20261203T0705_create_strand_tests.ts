import { sql, type Kysely } from 'kysely';

// A strand test: lightener or remover tried on a hidden strand before the real thing. A quote that lightens
// previously coloured hair warns while none is on record (common practice: strand test first).
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table strand_tests (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      client_id uuid not null references clients(id) on delete cascade,
      tested_at timestamptz not null,
      tested text not null check (length(tested) between 1 and 300),
      product_type text not null check (product_type in
        ('lightener', 'remover', 'permanent', 'demi_permanent', 'direct_dye', 'toner', 'bond_builder')),
      developer_percent numeric check (developer_percent >= 0),
      minutes integer not null check (minutes between 1 and 240),
      result text not null check (result in ('passed', 'fragile', 'failed')),
      notes text not null default '',
      photo_id uuid references client_photos(id) on delete set null,
      recorded_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now()
    );
    create index strand_tests_client on strand_tests (client_id, tested_at desc);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table strand_tests`.execute(db);
}
