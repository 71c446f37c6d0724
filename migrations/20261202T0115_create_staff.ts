import { sql, type Kysely } from 'kysely';

// Stylists (and other staff who take clients) with skills, their working hours as RRULEs, and time off.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table staff (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      user_id uuid unique references users(id) on delete set null,
      display_name text not null,
      skills text[] not null default '{}',
      max_clients_at_once integer not null default 1 check (max_clients_at_once between 1 and 6),
      active boolean not null default true
    );
    create index staff_salon on staff(salon_id);

    create table staff_hours (
      id uuid primary key default gen_random_uuid(),
      staff_id uuid not null references staff(id) on delete cascade,
      rrule text not null,
      start_time time not null,
      end_time time not null check (end_time > start_time)
    );
    create index staff_hours_staff on staff_hours(staff_id);

    create table time_off (
      id uuid primary key default gen_random_uuid(),
      staff_id uuid not null references staff(id) on delete cascade,
      during tstzrange not null check (not isempty(during)),
      reason text not null default ''
    );
    create index time_off_staff on time_off using gist (staff_id, during);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table time_off; drop table staff_hours; drop table staff;`.execute(db);
}
