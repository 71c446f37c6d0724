import type { Db } from '../../db/database';
import type { SessionUser } from '../../../shared/schemas/auth.schemas';
import type { MixLog, MixLogList, ProductType, WriteMixLog } from '../../../shared/schemas/mix-log.schemas';
import { CalculatorError, checkDeveloperStrength, percentToVolume } from '../../../shared/calculators/developer';
import { AppError, forbidden, notFound } from '../../lib/app-error';
import { productCentsPerGram } from '../quote-prices/quote-prices.repository';
import { findBookingForMixLog, insertMixLogs, listMixLogs, listSittingStarts, nextBowlNo, type MixLogRow } from './mix-logs.repository';

const round = (n: number, places = 1) => Math.round(n * 10 ** places) / 10 ** places;
const invalid = (field: string, message: string) => new AppError('VALIDATION_FAILED', 400, message, { [field]: message });

export function toView(r: MixLogRow): MixLog {
  const pct = r.developer_percent === null ? null : Number(r.developer_percent);
  return {
    id: r.id, sittingSeq: r.sitting_seq, bowlNo: r.bowl_no, productType: r.product_type, shadeNotes: r.shade_notes,
    developerPercent: pct, developerVolume: pct === null ? null : round(percentToVolume(pct)), ratio: r.ratio, grams: r.grams,
    appliedTo: r.applied_to, plannedMinutes: r.planned_minutes, actualMinutes: r.actual_minutes, heat: r.heat,
    resultNotes: r.result_notes, createdAt: r.created_at.toISOString(),
  };
}

/** The booking, within the caller's salon; writes only by desk, owner, or the booking's own stylist. */
async function bookingFor(db: Db, user: SessionUser, bookingId: string, writing: boolean) {
  const booking = await findBookingForMixLog(db, user.salonId, bookingId);
  if (!booking) throw notFound('That booking');
  if (writing && user.role === 'stylist' && booking.stylist_user_id !== user.id) throw forbidden();
  return { ...booking, maxPercent: Number(booking.max_developer_percent) };
}

/** A mix log records what was done, so the sitting must exist and have started. */
async function requireStarted(db: Db, bookingId: string, seq: number, field: string, now: Date) {
  const sitting = (await listSittingStarts(db, bookingId)).find((s) => s.seq === seq);
  if (!sitting) throw invalid(field, `This booking has no sitting ${seq}.`);
  if (sitting.start > now) throw invalid(field, `Sitting ${seq} has not started yet; write the mix log once it has.`);
}

/** Refuses a developer above the salon's maximum, naming the field (also used by strand tests). */
export function checkStrength(percent: number | null, maxPercent: number, field: string) {
  if (percent === null) return;
  try {
    checkDeveloperStrength(percent, maxPercent, field);
  } catch (e) {
    if (e instanceof CalculatorError) throw invalid(e.field, e.message);
    throw e;
  }
}

export async function mixLogList(db: Db, user: SessionUser, bookingId: string, now: Date): Promise<MixLogList> {
  const booking = await bookingFor(db, user, bookingId, false);
  const [sittings, rows, costs] = await Promise.all([listSittingStarts(db, bookingId), listMixLogs(db, bookingId), productCentsPerGram(db, user.salonId)]);
  const logs = rows.map(toView);
  return {
    maxDeveloperPercent: booking.maxPercent,
    logs,
    sittings: sittings.map((s) => {
      const byType = new Map<ProductType, number>();
      for (const log of logs.filter((l) => l.sittingSeq === s.seq)) {
        byType.set(log.productType, (byType.get(log.productType) ?? 0) + log.grams.reduce((a, p) => a + p.grams, 0));
      }
      const totals = [...byType].map(([productType, grams]) => ({ productType, grams: round(grams) }));
      // A type used without a cost set makes the estimate unknown rather than too low.
      const priced = totals.every((t) => costs[t.productType] !== undefined);
      const estimatedCostCents = priced ? Math.round(totals.reduce((a, t) => a + t.grams * costs[t.productType]!, 0)) : null;
      return { seq: s.seq, start: s.start.toISOString(), started: s.start <= now, totals, totalGrams: round(totals.reduce((a, t) => a + t.grams, 0)), estimatedCostCents };
    }),
  };
}

export async function writeMixLog(db: Db, user: SessionUser, bookingId: string, body: WriteMixLog, now: Date): Promise<MixLog> {
  const booking = await bookingFor(db, user, bookingId, true);
  checkStrength(body.developerPercent, booking.maxPercent, 'developerPercent');
  await requireStarted(db, bookingId, body.sittingSeq, 'sittingSeq', now);
  if ((await listMixLogs(db, bookingId, body.sittingSeq)).some((l) => l.bowl_no === body.bowlNo)) {
    throw new AppError('CONFLICT', 409, `Bowl ${body.bowlNo} of sitting ${body.sittingSeq} is already written.`, { bowlNo: 'This bowl number is taken.' });
  }
  const [row] = await insertMixLogs(db, [{ ...body, salonId: user.salonId, bookingId, createdBy: user.id }]);
  return toView(row);
}

/** "Repeat last time": copies an earlier sitting's bowls (same client), leaving actual minutes and results blank. */
export async function repeatMixLog(db: Db, user: SessionUser, bookingId: string, input: { fromBookingId: string; sitting: number; intoSitting: number }, now: Date) {
  const booking = await bookingFor(db, user, bookingId, true);
  const source = await findBookingForMixLog(db, user.salonId, input.fromBookingId);
  if (!source || source.client_id !== booking.client_id) throw notFound('An earlier booking of this client');
  if (input.fromBookingId === bookingId && input.sitting === input.intoSitting) throw invalid('sitting', 'Pick an earlier sitting to copy from.');
  await requireStarted(db, bookingId, input.intoSitting, 'intoSitting', now);
  const bowls = await listMixLogs(db, input.fromBookingId, input.sitting);
  if (bowls.length === 0) throw invalid('sitting', `Sitting ${input.sitting} of that booking has no mix log to repeat.`);
  // The salon's maximum may have been lowered since; a copy must obey today's setting.
  for (const b of bowls) checkStrength(b.developer_percent === null ? null : Number(b.developer_percent), booking.maxPercent, 'developerPercent');
  const first = await nextBowlNo(db, bookingId, input.intoSitting);
  const rows = await insertMixLogs(
    db,
    bowls.map((b, i) => {
      const v = toView(b);
      return {
        sittingSeq: input.intoSitting, bowlNo: first + i, productType: v.productType, shadeNotes: v.shadeNotes, developerPercent: v.developerPercent,
        ratio: v.ratio, grams: v.grams, appliedTo: v.appliedTo, plannedMinutes: v.plannedMinutes, actualMinutes: null, heat: v.heat, resultNotes: '',
        salonId: user.salonId, bookingId, createdBy: user.id,
      };
    }),
  );
  return { copied: rows.length, logs: rows.map(toView) };
}
