import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { SittingRun, TapAction } from '@shared/schemas/day-of-service.schemas';
import type { Salon } from '@shared/schemas/salon.schemas';
import { bookingStatusFor } from '@shared/rules/sitting-status';
import { AppError, notFound } from '@server/lib/app-error';
import { auditBookingChange, bookingSnapshot, findStaffIdForUser } from '../bookings';
import { lockStylists } from '../planning';
import { findSalon } from '../salon';
import { bookingOwner, findSittingForTap, insertTap, setBookingStatus, type SittingForTap } from './sitting-run.repository';
import { auditDay, tapBefore, toSittingRun } from './sitting-run';

/** Who may make a tap: the desk's (arrival, no-show) or also the stylist on the booking (steps). */
export type TapDoor = 'desk' | 'stylist_or_desk';

export interface TapRequest {
  user: SessionUser;
  bookingId: string;
  /** The sitting, counted from 1. */
  seq: number;
  door: TapDoor;
}

/** What one tap did: kept as a tap (to undo) unless it is an undo itself; the words go into the audit entry. */
export interface TapDone {
  action: TapAction | 'undo';
  stepSeq: number | null;
  audit: string;
}

export type TapWork = (trx: Db, salon: Salon, found: SittingForTap) => Promise<TapDone>;

const DESK_ROLES = ['front_desk', 'owner'];

/** The stylist on the booking, or the desk and the owner; any other stylist is told why not. */
export async function assertMayTap(db: Db, user: SessionUser, found: SittingForTap, door: TapDoor): Promise<void> {
  if (DESK_ROLES.includes(user.role)) return;
  if (door === 'desk') throw new AppError('FORBIDDEN', 403, 'The front desk marks arrivals and no-shows.');
  if (user.role === 'stylist' && (await findStaffIdForUser(db, user.id)) === found.booking.stylistId) return;
  throw new AppError('FORBIDDEN', 403, "Only the booking's own stylist (or the front desk) can tap its steps.");
}

/**
 * The frame of every tap: the caller's salon, the booking's stylist locked as for any other change to the book, the
 * refusals shared by all taps (another salon's booking, a hold, a cancelled booking, a no-show sitting), then the tap's
 * own work; afterwards the booking's status follows its sittings, the tap is kept for undo, and the audit log gets one
 * entry with the sitting before and after. One transaction: a refusal stores nothing.
 */
export async function runTap(db: Kysely<Database>, req: TapRequest, now: Date, work: TapWork): Promise<SittingRun> {
  const salon = await findSalon(db, req.user.salonId);
  return db.transaction().execute(async (trx) => {
    const owner = await bookingOwner(trx, req.bookingId);
    // Another salon's booking answers as one that does not exist, as every other booking route does.
    if (!owner || owner.salonId !== salon.id) throw notFound('That booking');
    await lockStylists(trx, [owner.stylistId]);
    const found = await findSittingForTap(trx, req.bookingId, req.seq);
    if (!found) throw notFound(`Sitting ${req.seq} of this booking`);
    await assertMayTap(trx, req.user, found, req.door);
    assertRunnable(found);
    const before = await bookingSnapshot(trx, req.bookingId);

    const done = await work(trx, salon, found);

    let after = await findSittingForTap(trx, req.bookingId, req.seq);
    if (!after) throw notFound('That booking'); // removed meanwhile (a lapsed hold's cleanup): nothing is kept
    // A paid checkout settles the visit: a last step tapped after the client paid does not move it back.
    const status = after.booking.status === 'checked_out' ? 'checked_out' : bookingStatusFor(after.sittingStatuses);
    if (status !== after.booking.status) {
      await setBookingStatus(trx, req.bookingId, status);
      after = { ...after, booking: { ...after.booking, status } };
    }
    if (done.action !== 'undo') {
      await insertTap(trx, found.sitting.id, { action: done.action, stepSeq: done.stepSeq, at: now, byUserId: req.user.id, before: tapBefore(found) });
    }
    await auditBookingChange(trx, {
      salonId: salon.id,
      actorUserId: req.user.id,
      bookingId: req.bookingId,
      action: done.audit,
      before: { ...before?.audit, day: auditDay(found) },
      alsoAfter: { day: auditDay(after) },
    });
    const undoable = done.action !== 'undo' && done.action !== 'no_show';
    return toSittingRun(after, salon.timeZone, undoable ? { action: done.action as TapAction, at: now } : null);
  });
}

/** Refusals every tap shares: the booking must be in the book, and the sitting not a no-show. */
function assertRunnable({ booking, sitting }: SittingForTap): void {
  if (booking.status === 'cancelled') throw new AppError('NOT_BOOKABLE', 409, 'This booking was cancelled: its sittings cannot be run.');
  if (booking.status === 'held') throw new AppError('NOT_BOOKABLE', 409, 'This time is only held online: it is not booked yet.');
  if (sitting.status === 'no_show') throw new AppError('CONFLICT', 409, `Sitting ${sitting.seq} was marked a no-show.`);
}
