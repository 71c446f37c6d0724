import { sql, type Kysely } from 'kysely';

// A client record belongs to one salon; it may be linked to a sign-in account (user with role client).
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table clients (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      user_id uuid unique references users(id) on delete set null,
      name text not null,
      email text,
      phone text,
      notes text not null default '',
      created_at timestamptz not null default now()
    );
    create index clients_salon on clients(salon_id);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table clients;`.execute(db);
}
