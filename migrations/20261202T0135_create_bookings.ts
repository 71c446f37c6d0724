import { sql, type Kysely } from 'kysely';

// No double booking, ever: the database itself refuses overlapping use of a chair, a basin, or a stylist's
// hands (hands_on and basin steps). Only live rows count, so a cancelled booking frees its time.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table bookings (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      client_id uuid not null references clients(id),
      service_id uuid not null references services(id),
      stylist_id uuid not null references staff(id),
      status text not null check (status in ('held', 'booked', 'checked_in', 'finished', 'cancelled', 'no_show')),
      step_plan jsonb not null,
      price_cents integer not null default 0 check (price_cents >= 0),
      deposit_cents integer not null default 0 check (deposit_cents >= 0),
      held_until timestamptz,
      cancel_reason text,
      created_by uuid references users(id),
      created_at timestamptz not null default now()
    );
    create index bookings_salon on bookings(salon_id, status);
    create index bookings_client on bookings(client_id);

    create table sittings (
      id uuid primary key default gen_random_uuid(),
      booking_id uuid not null references bookings(id) on delete cascade,
      seq integer not null check (seq >= 1),
      chair_id uuid not null references chairs(id),
      during tstzrange not null check (not isempty(during) and lower_inc(during) and not upper_inc(during)),
      live boolean not null default true,
      unique (booking_id, seq),
      constraint sittings_no_chair_overlap exclude using gist (chair_id with =, during with &&) where (live)
    );

    create table booking_steps (
      id uuid primary key default gen_random_uuid(),
      sitting_id uuid not null references sittings(id) on delete cascade,
      seq integer not null check (seq >= 1),
      kind text not null check (kind in ('hands_on', 'developing', 'basin')),
      label text not null default '',
      stylist_id uuid not null references staff(id),
      basin_id uuid references basins(id),
      during tstzrange not null check (not isempty(during) and lower_inc(during) and not upper_inc(during)),
      live boolean not null default true,
      unique (sitting_id, seq),
      check ((kind = 'basin') = (basin_id is not null)),
      constraint steps_no_hands_overlap exclude using gist (stylist_id with =, during with &&)
        where (live and kind in ('hands_on', 'basin')),
      constraint steps_no_basin_overlap exclude using gist (basin_id with =, during with &&)
        where (live and basin_id is not null)
    );
    create index booking_steps_during on booking_steps using gist (during);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table booking_steps; drop table sittings; drop table bookings;`.execute(db);
}
