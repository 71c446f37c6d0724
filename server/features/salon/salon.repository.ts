import type { Selectable } from 'kysely';
import type { Db } from '@server/db/database';
import type { SalonsTable } from '@server/db/schema';
import type { Salon } from '@shared/schemas/salon.schemas';
import type { HoursRule } from '@shared/engine/scenario.schemas';
import { AppError } from '@server/lib/app-error';
import { WIDENING_FAMILIES, type WideningFamily } from '@shared/rules/skin-test-need';
import type { ProcessingLimits } from '@shared/rules/processing-limits';
import type { LiftPerSitting } from '@shared/quotes/lift-per-sitting';

export async function findSalon(db: Db, id: string): Promise<Salon> {
  return toSalon(await db.selectFrom('salons').selectAll().where('id', '=', id).executeTakeFirstOrThrow());
}

export function toSalon(row: Selectable<SalonsTable>): Salon {
  return {
    id: row.id,
    name: row.name,
    slug: row.slug,
    timeZone: row.time_zone,
    currency: row.currency,
    country: row.country,
    address: row.address,
    phone: row.phone,
    skinTestLeadHours: row.skin_test_lead_hours,
    skinTestValidityDays: row.skin_test_validity_days,
    skinTestFamilies: row.skin_test_families.filter((f): f is WideningFamily => (WIDENING_FAMILIES as readonly string[]).includes(f)),
    granularityMinutes: row.granularity_minutes,
    cancellationWindowHours: row.cancellation_window_hours,
    cancellationKeeps: row.cancellation_keeps,
    noShowGraceMinutes: row.no_show_grace_minutes,
    unpaidDepositReleaseHours: row.unpaid_deposit_release_hours,
    lateStartLimitMinutes: row.late_start_limit_minutes,
    ...planningRulesOf(row),
  };
}

/** The salon's processing limits and lift per sitting, from its row. */
export function planningRulesOf(row: Selectable<SalonsTable>): { processingLimits: ProcessingLimits; liftPerSitting: LiftPerSitting } {
  return {
    processingLimits: {
      lightener: row.lightener_max_minutes,
      oxidative_colour: row.oxidative_colour_max_minutes,
      toner_oxidative: row.toner_oxidative_max_minutes,
      colour_remover: row.colour_remover_max_minutes,
    },
    liftPerSitting: { virgin: row.lift_virgin_levels, coloured: row.lift_coloured_levels, compromised: row.lift_compromised_levels },
  };
}

/** The columns that store processing limits and lift per sitting (either may be left out: unchanged). */
export function planningRulesColumns(rules: { processingLimits?: ProcessingLimits; liftPerSitting?: LiftPerSitting }) {
  const l = rules.processingLimits;
  const lift = rules.liftPerSitting;
  return {
    ...(l && {
      lightener_max_minutes: l.lightener,
      oxidative_colour_max_minutes: l.oxidative_colour,
      toner_oxidative_max_minutes: l.toner_oxidative,
      colour_remover_max_minutes: l.colour_remover,
    }),
    ...(lift && { lift_virgin_levels: lift.virgin, lift_coloured_levels: lift.coloured, lift_compromised_levels: lift.compromised }),
  };
}

/** The salon's lines of opening hours, as the engine reads them (RFC 5545 text, `HH:mm` times). */
export async function listSalonHours(db: Db, salonId: string): Promise<HoursRule[]> {
  const rows = await db
    .selectFrom('salon_hours')
    .select(['rrule', 'start_time', 'end_time'])
    .where('salon_id', '=', salonId)
    .orderBy('start_time')
    .orderBy('id')
    .execute();
  return rows.map((h) => ({ rrule: h.rrule, start: h.start_time.slice(0, 5), end: h.end_time.slice(0, 5) }));
}

/** The country phone numbers typed without a country code are read in. */
export async function salonCountry(db: Db, salonId: string): Promise<string> {
  return (await db.selectFrom('salons').select('country').where('id', '=', salonId).executeTakeFirstOrThrow()).country;
}

/** The salon a new client signs up with: the named one, or the only/oldest one on this installation. */
export async function findSalonIdForSignUp(db: Db, slug: string | undefined): Promise<string> {
  let query = db.selectFrom('salons').select('id').orderBy('created_at').limit(1);
  if (slug) query = query.where('slug', '=', slug);
  const row = await query.executeTakeFirst();
  if (!row) throw new AppError('NOT_FOUND', 404, 'That salon was not found.');
  return row.id;
}
