import type { Db } from '@server/db/database';
import type { SalonSettings } from '@shared/schemas/salon-settings.schemas';
import { planningRulesColumns, planningRulesOf } from '../salon';

const hhmm = (t: string) => t.slice(0, 5);

/** The settings as stored: the planning rules and tax always present (a write may leave them out). */
export async function readSalonSettings(
  db: Db,
  salonId: string,
): Promise<SalonSettings & Required<Pick<SalonSettings, 'processingLimits' | 'liftPerSitting' | 'taxRateMilliPercent' | 'taxInclusive'>>> {
  const [row, hours] = await Promise.all([
    db.selectFrom('salons').selectAll().where('id', '=', salonId).executeTakeFirstOrThrow(),
    db.selectFrom('salon_hours').select(['rrule', 'start_time', 'end_time']).where('salon_id', '=', salonId).orderBy('start_time').orderBy('id').execute(),
  ]);
  return {
    name: row.name,
    address: row.address,
    phone: row.phone,
    timeZone: row.time_zone,
    currency: row.currency,
    country: row.country,
    hours: hours.map((h) => ({ rrule: h.rrule, start: hhmm(h.start_time), end: hhmm(h.end_time) })),
    skinTestLeadHours: row.skin_test_lead_hours,
    skinTestValidityDays: row.skin_test_validity_days,
    skinTestFamilies: row.skin_test_families as SalonSettings['skinTestFamilies'],
    holdMinutes: row.hold_minutes,
    cancellationWindowHours: row.cancellation_window_hours,
    cancellationKeeps: row.cancellation_keeps,
    noShowGraceMinutes: row.no_show_grace_minutes,
    unpaidDepositReleaseHours: row.unpaid_deposit_release_hours,
    lateStartLimitMinutes: row.late_start_limit_minutes,
    quietFrom: hhmm(row.quiet_from),
    quietTo: hhmm(row.quiet_to),
    reminderOffsetsHours: row.reminder_offsets_hours,
    maxDeveloperPercent: Number(row.max_developer_percent),
    taxRateMilliPercent: row.tax_rate_milli_percent,
    taxInclusive: row.tax_inclusive,
    ...planningRulesOf(row),
  };
}

/** Replaces the settings and the opening hours together (call inside a transaction). */
export async function writeSalonSettings(db: Db, salonId: string, s: SalonSettings): Promise<void> {
  await db
    .updateTable('salons')
    .set({
      name: s.name,
      address: s.address,
      phone: s.phone,
      time_zone: s.timeZone,
      currency: s.currency,
      ...(s.country && { country: s.country }),
      skin_test_lead_hours: s.skinTestLeadHours,
      skin_test_validity_days: s.skinTestValidityDays,
      ...(s.skinTestFamilies && { skin_test_families: s.skinTestFamilies }),
      hold_minutes: s.holdMinutes,
      cancellation_window_hours: s.cancellationWindowHours,
      cancellation_keeps: s.cancellationKeeps,
      ...(s.noShowGraceMinutes !== undefined && { no_show_grace_minutes: s.noShowGraceMinutes }),
      ...(s.unpaidDepositReleaseHours !== undefined && { unpaid_deposit_release_hours: s.unpaidDepositReleaseHours }),
      ...(s.lateStartLimitMinutes !== undefined && { late_start_limit_minutes: s.lateStartLimitMinutes }),
      quiet_from: s.quietFrom,
      quiet_to: s.quietTo,
      reminder_offsets_hours: [...s.reminderOffsetsHours].sort((a, b) => b - a),
      max_developer_percent: s.maxDeveloperPercent,
      ...(s.taxRateMilliPercent !== undefined && { tax_rate_milli_percent: s.taxRateMilliPercent }),
      ...(s.taxInclusive !== undefined && { tax_inclusive: s.taxInclusive }),
      ...planningRulesColumns(s),
    })
    .where('id', '=', salonId)
    .execute();
  await db.deleteFrom('salon_hours').where('salon_id', '=', salonId).execute();
  await db
    .insertInto('salon_hours')
    .values(s.hours.map((h) => ({ salon_id: salonId, rrule: h.rrule, start_time: h.start, end_time: h.end })))
    .execute();
}
