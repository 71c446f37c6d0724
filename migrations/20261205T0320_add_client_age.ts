import { sql, type Kysely } from 'kysely';

// A client's date of birth (optional), and a guardian's consent recorded by the desk (who consented, who recorded
// it, when): oxidative hair dyes are labelled in the EU as "not intended for use on persons under the age of 16"
// (Regulation (EC) No 1223/2009, Annex III), so such colour for a younger client needs the consent on record.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table clients add column date_of_birth date check (date_of_birth >= date '1900-01-01');
    create table guardian_consents (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete restrict,
      client_id uuid not null references clients(id) on delete restrict,
      guardian_name text not null check (length(guardian_name) between 1 and 120),
      relationship text not null check (length(relationship) between 1 and 60),
      note text not null default '' check (length(note) <= 1000),
      recorded_by uuid references users(id) on delete set null,
      recorded_by_name text not null,
      recorded_at timestamptz not null default now()
    );
    create index guardian_consents_client on guardian_consents(client_id, recorded_at);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    drop table guardian_consents;
    alter table clients drop column date_of_birth;
  `.execute(db);
}
