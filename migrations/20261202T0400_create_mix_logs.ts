import { sql, type Kysely } from 'kysely';

// What went into each bowl at a sitting, so the next sitting can repeat what worked. Product types are
// generic trade words, never brand names. The salon's developer maximum is a setting because limits differ
// by jurisdiction; 12 % is the EU limit for hair products (Reg. (EC) 1223/2009, Annex III entry 12).
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table salons add column max_developer_percent numeric not null default 12
      check (max_developer_percent > 0 and max_developer_percent <= 100);

    create table mix_logs (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      booking_id uuid not null references bookings(id) on delete cascade,
      sitting_seq integer not null check (sitting_seq >= 1),
      bowl_no integer not null check (bowl_no >= 1),
      product_type text not null check (product_type in
        ('lightener', 'remover', 'permanent', 'demi_permanent', 'direct_dye', 'toner', 'bond_builder')),
      shade_notes text not null default '',
      developer_percent numeric check (developer_percent >= 0),
      ratio text not null default '',
      grams jsonb not null,
      applied_to text not null default '',
      planned_minutes integer check (planned_minutes >= 0),
      actual_minutes integer check (actual_minutes >= 0),
      heat boolean not null default false,
      result_notes text not null default '',
      created_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now(),
      unique (booking_id, sitting_seq, bowl_no),
      foreign key (booking_id, sitting_seq) references sittings(booking_id, seq) on delete cascade
    );
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table mix_logs; alter table salons drop column max_developer_percent;`.execute(db);
}
