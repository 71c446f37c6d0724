import { sql, type Kysely } from 'kysely';

// The small list of retail products the owner keeps (shampoos, masks, oils) for checkout to sell. A product is
// retired rather than deleted, since sold lines will refer to it. Stock never goes below zero: checkout takes
// from it with `stock = stock - n where stock >= n`, and the check is the database's last word on a race.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    create table retail_products (
      id uuid primary key default gen_random_uuid(),
      salon_id uuid not null references salons(id) on delete cascade,
      name text not null check (length(name) between 1 and 120),
      price_cents integer not null check (price_cents >= 0),
      stock integer not null,
      active boolean not null default true,
      created_at timestamptz not null default now(),
      constraint retail_products_stock_not_below_zero check (stock >= 0),
      unique (salon_id, name)
    );
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`drop table retail_products;`.execute(db);
}
