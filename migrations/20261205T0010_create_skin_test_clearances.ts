import { sql, type Kysely } from 'kysely';

// An owner's recorded decision that lets oxidative colour follow an earlier positive skin test (who, when, why),
// kept for good: a safety record is never deleted with a client, a booking or a staff account. The recorder's name
// is kept beside the id so it survives the account. The lead time is at least 48 hours (the test is read then), and
// a salon may widen which product families need a skin test beyond oxidative colour and oxidative toner.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table skin_test_clearances (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete restrict,
      client_id uuid not null references clients(id) on delete restrict,
      recorded_by uuid references users(id) on delete set null,
      recorded_by_name text not null,
      recorded_at timestamptz not null default now(),
      reason text not null check (length(reason) between 10 and 2000)
    );
    create index skin_test_clearances_client on skin_test_clearances(client_id, recorded_at);
    update salons set skin_test_lead_hours = 48 where skin_test_lead_hours < 48;
    alter table salons drop constraint salons_skin_test_lead_hours_check;
    alter table salons add constraint salons_skin_test_lead_hours_check check (skin_test_lead_hours between 48 and 720);
    alter table salons add column skin_test_families text[] not null default '{}'
      check (skin_test_families <@ array['lightener', 'colour_remover', 'direct_dye', 'toner_direct', 'bond_care']::text[]);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    alter table salons drop column skin_test_families;
    alter table salons drop constraint salons_skin_test_lead_hours_check;
    alter table salons add constraint salons_skin_test_lead_hours_check check (skin_test_lead_hours between 0 and 720);
    drop table skin_test_clearances;
  `.execute(db);
}
