import { sql, type Kysely } from 'kysely';

// Set-up: what a late cancellation keeps, deposits as a share of the price, and chairs or basins
// taken out of service for a period (the engine treats those periods as taken).
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table salons add column cancellation_keeps text not null default 'deposit'
      check (cancellation_keeps in ('deposit', 'nothing'));
    alter table services add column deposit_percent numeric
      check (deposit_percent is null or (deposit_percent > 0 and deposit_percent <= 100));
    create table out_of_service (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      chair_id uuid references chairs(id) on delete cascade,
      basin_id uuid references basins(id) on delete cascade,
      during tstzrange not null check (not isempty(during)),
      reason text not null default '',
      check ((chair_id is null) <> (basin_id is null))
    );
    create index out_of_service_salon on out_of_service using gist (salon_id, during);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    drop table out_of_service;
    alter table services drop column deposit_percent;
    alter table salons drop column cancellation_keeps;
  `.execute(db);
}
