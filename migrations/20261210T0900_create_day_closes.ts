import { sql, type Kysely } from 'kysely';

// The day's close at the desk: the takings of one salon day as they were when it was closed, the cash the desk
// counted in the drawer against the cash the payments say should be there, and the difference. One close stands per
// salon day (a second is refused); the owner may reopen a close, which keeps it (with who reopened it and when) and
// lets the desk close the day again.
//

export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table day_closes (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      -- the salon's local date
      day date not null,
      currency char(3) not null,
      -- the day's takings as shown when it was closed (server/features/takings)
      totals jsonb not null,
      expected_cash_cents integer not null,
      counted_cash_cents integer not null check (counted_cash_cents >= 0),
      difference_cents integer not null generated always as (counted_cash_cents - expected_cash_cents) stored,
      note text not null default '',
      closed_by uuid references users(id) on delete set null,
      closed_at timestamptz not null default now(),
      reopened_by uuid references users(id) on delete set null,
      reopened_at timestamptz
    );
    create unique index day_closes_one_standing on day_closes(salon_id, day) where reopened_at is null;
    create index day_closes_salon_day on day_closes(salon_id, day);
    create index payments_salon_created on payments(salon_id, created_at);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    drop index payments_salon_created;
    drop table day_closes;
  `.execute(db);
}
