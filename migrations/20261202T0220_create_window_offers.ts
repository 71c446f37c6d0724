import { sql, type Kysely } from 'kysely';

// A hands-free window offered to standby clients: each gets a link; the first to accept books it.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table window_offers (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      standby_entry_id uuid not null references standby_entries(id) on delete cascade,
      client_id uuid not null references clients(id) on delete cascade,
      service_id uuid not null references services(id),
      stylist_id uuid not null references staff(id),
      starts_at timestamptz not null,
      token_hash text not null unique,
      status text not null check (status in ('offered', 'taken', 'gone', 'expired')),
      booking_id uuid references bookings(id) on delete set null,
      created_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now(),
      expires_at timestamptz not null
    );
    create index window_offers_slot on window_offers(stylist_id, starts_at);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table window_offers;`.execute(db);
}
