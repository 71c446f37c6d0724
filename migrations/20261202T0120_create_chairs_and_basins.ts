import { sql, type Kysely } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table chairs (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      name text not null,
      active boolean not null default true,
      unique (salon_id, name)
    );
    create table basins (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      name text not null,
      active boolean not null default true,
      unique (salon_id, name)
    );
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table basins; drop table chairs;`.execute(db);
}
