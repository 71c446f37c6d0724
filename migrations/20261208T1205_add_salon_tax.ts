import { sql, type Kysely } from 'kysely';

// The salon's tax: its rate in thousandths of a percent (8.25 % is 8250, so three decimals stay exact integers),
// 0 to 50 %, and whether menu and product prices include it. Defaults: no tax, prices without it.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table salons
      add column tax_rate_milli_percent integer not null default 0 check (tax_rate_milli_percent between 0 and 50000),
      add column tax_inclusive boolean not null default false;
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`alter table salons drop column tax_rate_milli_percent, drop column tax_inclusive;`.execute(db);
}
