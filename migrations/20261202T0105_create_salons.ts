import { sql, type Kysely } from 'kysely';

// Each salon (location) is a row from day one; opening hours are RRULEs expanded in the salon's zone.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table salons (
      id uuid primary key default gen_random_uuid(),
      slug text not null unique,
      name text not null,
      time_zone text not null,
      currency char(3) not null,
      address text not null default '',
      phone text not null default '',
      skin_test_lead_hours integer not null default 48 check (skin_test_lead_hours between 0 and 720),
      skin_test_validity_days integer not null default 182 check (skin_test_validity_days between 1 and 3650),
      hold_minutes integer not null default 10 check (hold_minutes between 1 and 120),
      granularity_minutes integer not null default 5 check (60 % granularity_minutes = 0),
      created_at timestamptz not null default now()
    );
    create table salon_hours (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      rrule text not null,
      start_time time not null,
      end_time time not null check (end_time > start_time)
    );
    create index salon_hours_salon on salon_hours(salon_id);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table salon_hours; drop table salons;`.execute(db);
}
