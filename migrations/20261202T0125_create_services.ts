import { sql, type Kysely } from 'kysely';

// A service's step plan is a JSON document (sittings → steps) validated by the shared zod schema;
// bookings copy the plan they were made with, so editing a service never changes a booking.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table services (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      name text not null,
      description text not null default '',
      category text not null check (category in ('consultation', 'skin_test', 'colour', 'cut', 'treatment')),
      skill text not null,
      price_cents integer not null check (price_cents >= 0),
      price_is_from boolean not null default false,
      online_bookable boolean not null default false,
      needs_skin_test boolean not null default false,
      step_plan jsonb not null,
      active boolean not null default true,
      unique (salon_id, name)
    );
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table services;`.execute(db);
}
