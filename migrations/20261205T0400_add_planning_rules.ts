import { sql, type Kysely } from 'kysely';

// The salon's planning rules: how long each limited product family may stay on the hair (minutes without heat,
// counted from the first section) and how many levels one sitting may lift by the state of the hair. Defaults
// are common practice; the checks hold the hard maxima (shared/rules/processing-limits.ts,
// shared/quotes/lift-per-sitting.ts) and keep careful hair from lifting more than healthier hair.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`
    alter table salons
      add column lightener_max_minutes integer not null default 50 check (lightener_max_minutes between 5 and 60),
      add column oxidative_colour_max_minutes integer not null default 45 check (oxidative_colour_max_minutes between 5 and 60),
      add column toner_oxidative_max_minutes integer not null default 30 check (toner_oxidative_max_minutes between 5 and 45),
      add column colour_remover_max_minutes integer not null default 60 check (colour_remover_max_minutes between 5 and 60),
      add column lift_virgin_levels integer not null default 3 check (lift_virgin_levels between 1 and 4),
      add column lift_coloured_levels integer not null default 2 check (lift_coloured_levels between 1 and 4),
      add column lift_compromised_levels integer not null default 1 check (lift_compromised_levels between 1 and 4),
      add constraint salons_lift_order check (lift_compromised_levels <= lift_coloured_levels and lift_coloured_levels <= lift_virgin_levels);
  `.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`
    alter table salons
      drop constraint salons_lift_order,
      drop column lightener_max_minutes,
      drop column oxidative_colour_max_minutes,
      drop column toner_oxidative_max_minutes,
      drop column colour_remover_max_minutes,
      drop column lift_virgin_levels,
      drop column lift_coloured_levels,
      drop column lift_compromised_levels;
  `.execute(db);
}
