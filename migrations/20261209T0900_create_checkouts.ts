import { sql, type Kysely } from 'kysely';

// A visit's checkout: what it came to (the receipt as computed by shared/money/checkout.ts) and how it was settled.
// One per booking (a second checkout of the same visit is refused by the unique key). The money itself stays in
// `payments`: the balance paid at checkout (card or cash, possibly split) and one tip row per stylist who shares it.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table checkouts (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      booking_id uuid not null unique references bookings(id) on delete restrict,
      currency char(3) not null,
      -- the computed receipt: lines, discount spread, tax, tip shares (as shared/money/checkout.ts answers it)
      receipt jsonb not null,
      subtotal_cents integer not null check (subtotal_cents >= 0),
      discount_cents integer not null default 0 check (discount_cents >= 0),
      tax_cents integer not null default 0 check (tax_cents >= 0),
      total_cents integer not null check (total_cents >= 0),
      deposit_applied_cents integer not null default 0 check (deposit_applied_cents >= 0),
      tip_cents integer not null default 0 check (tip_cents >= 0),
      -- what was left to pay after the deposit, tip included
      due_cents integer not null check (due_cents >= 0),
      status text not null default 'open' check (status in ('open', 'paid')),
      created_by uuid references users(id) on delete set null,
      created_at timestamptz not null default now(),
      paid_at timestamptz
    );
    create index checkouts_salon_paid on checkouts(salon_id, paid_at);

    alter table payments
      add column checkout_id uuid references checkouts(id) on delete restrict,
      -- a tip's stylist (one tip row per stylist who shares it)
      add column staff_id uuid references staff(id) on delete set null,
      add constraint payments_tip_names_stylist check ((kind = 'tip') = (staff_id is not null));
    create index payments_checkout on payments(checkout_id) where checkout_id is not null;
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    drop index payments_checkout;
    alter table payments drop constraint payments_tip_names_stylist, drop column staff_id, drop column checkout_id;
    drop table checkouts;
  `.execute(db);
}
