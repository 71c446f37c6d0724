import { sql, type Kysely } from 'kysely';

// A consultation records the client's hair as the stylist found it; its quote is the estimate the stylist
// edited and the desk books (bookings.quote_id). Quote rules: shared/quotes/propose-quote.ts.
// The salon's hourly rate for correction work and its cost per gram per generic product type price quotes.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table salons add column correction_cents_per_hour integer not null default 9000
      check (correction_cents_per_hour >= 0);

    create table product_costs (
      salon_id uuid not null references salons(id) on delete cascade,
      product_type text not null check (product_type in
        ('lightener', 'remover', 'permanent', 'demi_permanent', 'direct_dye', 'toner', 'bond_builder')),
      cents_per_gram numeric not null check (cents_per_gram >= 0),
      primary key (salon_id, product_type)
    );

    create table consultations (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      client_id uuid not null references clients(id) on delete cascade,
      details jsonb not null,
      created_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now()
    );
    create index consultations_client on consultations (client_id, created_at desc);

    create table consultation_photos (
      consultation_id uuid not null references consultations(id) on delete cascade,
      photo_id uuid not null references client_photos(id) on delete cascade,
      primary key (consultation_id, photo_id)
    );

    create table quotes (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      consultation_id uuid not null unique references consultations(id) on delete cascade,
      client_id uuid not null references clients(id) on delete cascade,
      service_id uuid not null references services(id),
      step_plan jsonb not null,
      price_cents integer not null check (price_cents >= 0),
      deposit_cents integer not null check (deposit_cents >= 0 and deposit_cents <= price_cents),
      notes text not null default '',
      warnings jsonb not null default '[]',
      status text not null default 'draft' check (status in ('draft', 'sent', 'accepted')),
      sent_at timestamptz,
      accepted_at timestamptz,
      updated_at timestamptz not null default now()
    );

    alter table bookings add column quote_id uuid references quotes(id) on delete set null;
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    alter table bookings drop column quote_id;
    drop table quotes; drop table consultation_photos; drop table consultations; drop table product_costs;
    alter table salons drop column correction_cents_per_hour;
  `.execute(db);
}
