import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import { mixLogWritable, type MixLog, type MixLogList, type WriteMixLog } from '@shared/schemas/mix-log.schemas';
import { CalculatorError, checkDeveloperStrength, percentToVolume } from '@shared/calculators/developer';
import { productUse } from '@shared/calculators/product-use';
import { AppError, notFound } from '@server/lib/app-error';
import { productCentsPerGram } from '../quote-prices';
import {
  findBookingForMixLog,
  insertMixLogs,
  listMixLogs,
  listRepeatSources,
  listSittingStarts,
  maxDeveloperPercent,
  nextBowlNo,
  type StoredBowl,
} from './mix-logs.repository';

const round = (n: number, places = 1) => Math.round(n * 10 ** places) / 10 ** places;
const invalid = (field: string, message: string) => new AppError('VALIDATION_FAILED', 400, message, { [field]: message });

// Trade volumes (6 % = 20 vol), as developer bottles are labelled and stylists say it.
const toView = (b: StoredBowl): MixLog => ({
  ...b,
  developerVolume: b.developerPercent === null ? null : round(percentToVolume(b.developerPercent, { trade: true })),
});

/**
 * The booking, as the caller may see it: within their salon, and for a stylist only the bookings they work on.
 * Anything else is "not found", as GET /api/bookings/:id answers, so a stylist cannot read or probe others' mix logs.
 */
async function bookingFor(db: Db, user: SessionUser, bookingId: string, what = 'That booking') {
  const booking = await findBookingForMixLog(db, user.salonId, bookingId);
  if (!booking || (user.role === 'stylist' && booking.stylistUserId !== user.id)) throw notFound(what);
  return booking;
}

/** Writing: the booking must be one the caller may see and not cancelled. */
async function bookingToWrite(db: Db, user: SessionUser, bookingId: string) {
  const booking = await bookingFor(db, user, bookingId);
  if (!mixLogWritable(booking.status)) throw new AppError('CONFLICT', 409, 'This booking is cancelled; its mix log can be read, but no bowls can be added.');
  return booking;
}

/** Bowls go into a sitting of this booking; it may not have started yet (the formula is often mixed ahead). */
async function requireSitting(db: Db, bookingId: string, seq: number, field: string) {
  if (!(await listSittingStarts(db, bookingId)).some((s) => s.seq === seq)) throw invalid(field, `This booking has no sitting ${seq}.`);
}

/** Refuses a developer above the salon's maximum, naming the field. */
function checkStrength(percent: number | null, maxPercent: number, field: string) {
  if (percent === null) return;
  try {
    checkDeveloperStrength(percent, maxPercent, field);
  } catch (e) {
    if (e instanceof CalculatorError) throw invalid(e.field, e.message);
    throw e;
  }
}

/** Refuses a developer above this salon's maximum, naming the field (a strand test is held to it too). */
export async function checkSalonStrength(db: Db, salonId: string, percent: number | null, field: string): Promise<void> {
  if (percent !== null) checkStrength(percent, await maxDeveloperPercent(db, salonId), field);
}

export async function mixLogList(db: Db, user: SessionUser, bookingId: string, now: Date): Promise<MixLogList> {
  const booking = await bookingFor(db, user, bookingId);
  const [sittings, rows, costs, sources] = await Promise.all([
    listSittingStarts(db, bookingId),
    listMixLogs(db, bookingId),
    productCentsPerGram(db, user.salonId),
    booking.clientId ? listRepeatSources(db, user.salonId, booking.clientId, user.role === 'stylist' ? user.id : null) : [],
  ]);
  const logs = rows.map(toView);
  return {
    bookingStatus: booking.status,
    maxDeveloperPercent: booking.maxDeveloperPercent,
    logs,
    sittings: sittings.map((s) => ({
      seq: s.seq,
      start: s.start.toISOString(),
      started: s.start <= now,
      ...productUse(
        logs.filter((l) => l.sittingSeq === s.seq).flatMap((l) => l.grams),
        costs,
      ),
    })),
    repeatSources: sources,
  };
}

export async function writeMixLog(db: Db, user: SessionUser, bookingId: string, body: WriteMixLog): Promise<MixLog> {
  const booking = await bookingToWrite(db, user, bookingId);
  checkStrength(body.developerPercent, booking.maxDeveloperPercent, 'developerPercent');
  await requireSitting(db, bookingId, body.sittingSeq, 'sittingSeq');
  // The unique (booking, sitting, bowl) key decides, so two saves of the same bowl at once cannot both land: the
  // second is answered 409 naming bowlNo (server/lib/unique-violation.ts).
  const [row] = await insertMixLogs(db, [{ ...body, salonId: user.salonId, bookingId, createdBy: user.id }]);
  return toView(row!); // one row back per row written
}

/** "Repeat last time": copies an earlier sitting's bowls (same client), leaving actual minutes and results blank. */
export async function repeatMixLog(db: Db, user: SessionUser, bookingId: string, input: { fromBookingId: string; sitting: number; intoSitting: number }) {
  const booking = await bookingToWrite(db, user, bookingId);
  // The copy is a read of the source's mix log, so the same rule applies: a stylist copies only their own bookings.
  const source = await bookingFor(db, user, input.fromBookingId, 'An earlier booking of this client');
  if (!booking.clientId || source.clientId !== booking.clientId) throw notFound('An earlier booking of this client');
  if (input.fromBookingId === bookingId && input.sitting === input.intoSitting) throw invalid('sitting', 'Pick an earlier sitting to copy from.');
  await requireSitting(db, bookingId, input.intoSitting, 'intoSitting');
  const bowls = await listMixLogs(db, input.fromBookingId, input.sitting);
  if (bowls.length === 0) throw invalid('sitting', `Sitting ${input.sitting} of that booking has no mix log to repeat.`);
  // The salon's maximum may have been lowered since; a copy must obey today's setting.
  for (const b of bowls) checkStrength(b.developerPercent, booking.maxDeveloperPercent, 'developerPercent');
  const first = await nextBowlNo(db, bookingId, input.intoSitting);
  const rows = await insertMixLogs(
    db,
    bowls.map((b, i) => ({
      sittingSeq: input.intoSitting,
      bowlNo: first + i,
      productType: b.productType,
      shadeNotes: b.shadeNotes,
      developerPercent: b.developerPercent,
      ratio: b.ratio,
      grams: b.grams,
      appliedTo: b.appliedTo,
      plannedMinutes: b.plannedMinutes,
      actualMinutes: null,
      heat: b.heat,
      resultNotes: '',
      salonId: user.salonId,
      bookingId,
      createdBy: user.id,
    })),
  );
  return { copied: rows.length, logs: rows.map(toView) };
}
