import type { Db } from '@server/db/database';
import type { Salon } from '@shared/schemas/salon.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { auditBookingChange } from './booking-audit.service';
import { chairFreeBetween } from './bookings.repository';
import { basinFreeBetween, listSittingSteps, setSittingChair, setStepBasin } from './change-booking.repository';
import { changeableSitting, takenMeanwhile } from './sitting-change';
import { listBasins } from './salon-resources.repository';

/*
 * Another chair or basin at the same times. The client's times and stylist do not change, so nothing is sent to them;
 * the constraints, the stylist's lock and the audit entry are those of every other change to the book.
 */

export interface UnitChange {
  bookingId: string;
  sittingId: string;
  /** Why, in the audit entry's words. */
  auditNote?: string;
}

const noted = (action: string, note: string | undefined) => (note ? `${action} (${note})` : action);

/** Seats a sitting that has not started in another chair of the salon, free and in service for the whole sitting. */
export async function changeSittingChair(db: Db, salon: Salon, actorUserId: string, change: UnitChange & { chairId: string }): Promise<void> {
  const { before, sitting } = await changeableSitting(db, salon, change.bookingId, change.sittingId);
  if (sitting.status !== 'booked') throw new AppError('CONFLICT', 409, `Sitting ${sitting.seq} has started: it stays in its chair.`);
  if (!(await chairFreeBetween(db, salon.id, change.chairId, sitting.start, sitting.end, change.bookingId))) {
    throw new AppError('CONFLICT', 409, 'That chair is not free (or not in service) for the whole sitting.');
  }
  await setSittingChair(db, sitting.id, change.chairId).catch((err) => takenMeanwhile(err, 'That chair was taken by another booking a moment ago.'));
  await auditBookingChange(db, {
    salonId: salon.id,
    actorUserId,
    bookingId: change.bookingId,
    action: noted(`changed the chair of sitting ${sitting.seq}`, change.auditNote),
    before: before.audit,
  });
}

/** Gives a basin step that has not started another basin of the salon, free and in service for the step. */
export async function changeStepBasin(db: Db, salon: Salon, actorUserId: string, change: UnitChange & { stepId: string; basinId: string }): Promise<void> {
  const { before, sitting } = await changeableSitting(db, salon, change.bookingId, change.sittingId);
  const step = (await listSittingSteps(db, sitting.id)).find((s) => s.id === change.stepId);
  if (!step || step.kind !== 'basin') throw notFound('That basin step of the sitting');
  if (step.actualStart) throw new AppError('CONFLICT', 409, `Step ${step.seq} “${step.label}” has started: it stays at its basin.`);
  if (!(await basinFreeBetween(db, salon.id, change.basinId, step.start, step.end, step.id))) {
    throw new AppError('CONFLICT', 409, 'That basin is not free (or not in service) for the whole step.');
  }
  await setStepBasin(db, step.id, change.basinId).catch((err) => takenMeanwhile(err, 'That basin was taken by another booking a moment ago.'));
  const names = new Map((await listBasins(db, salon.id)).map((b) => [b.id, b.name]));
  await auditBookingChange(db, {
    salonId: salon.id,
    actorUserId,
    bookingId: change.bookingId,
    action: noted(`changed the basin of sitting ${sitting.seq} step ${step.seq} “${step.label}”`, change.auditNote),
    before: { ...before.audit, basin: names.get(step.basinId ?? '') ?? null },
    alsoAfter: { basin: names.get(change.basinId) ?? null },
  });
}
