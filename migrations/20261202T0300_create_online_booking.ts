import { sql, type Kysely } from 'kysely';

// Online booking: a hold has no client until the person signs in and claims it with its secret; deposits
// are recorded per payment attempt; accepted cautions are kept with the booking (text version and time).
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table bookings alter column client_id drop not null;
    alter table bookings add constraint bookings_client_unless_held check (client_id is not null or status = 'held');
    alter table bookings add column hold_secret_hash text;

    create table payments (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      -- no foreign key: a hold that lapsed is removed, and its late payment must still be found to refund it
      booking_id uuid not null,
      client_id uuid references clients(id) on delete set null,
      provider_ref text,
      amount_cents integer not null check (amount_cents > 0),
      currency char(3) not null,
      status text not null check (status in ('succeeded', 'declined', 'refunded')),
      message text not null default '',
      created_at timestamptz not null default now()
    );
    create index payments_booking on payments(booking_id);

    create table caution_acceptances (
      id uuid primary key default gen_random_uuid(),
      booking_id uuid not null references bookings(id) on delete cascade,
      user_id uuid references users(id) on delete set null,
      version text not null,
      texts jsonb not null,
      accepted_at timestamptz not null default now()
    );

    create table hair_histories (
      client_id uuid primary key references clients(id) on delete cascade,
      answers jsonb not null,
      updated_at timestamptz not null default now()
    );

    create table client_photos (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      client_id uuid not null references clients(id) on delete cascade,
      booking_id uuid references bookings(id) on delete set null,
      kind text not null check (kind in ('hair_now', 'wanted')),
      storage_key text not null unique,
      mime text not null,
      bytes integer not null,
      width integer not null,
      height integer not null,
      created_at timestamptz not null default now()
    );
    create index client_photos_client on client_photos(client_id);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    drop table client_photos; drop table hair_histories; drop table caution_acceptances; drop table payments;
    alter table bookings drop column hold_secret_hash;
    alter table bookings drop constraint bookings_client_unless_held;
    alter table bookings alter column client_id set not null;
  `.execute(db);
}
