import type { Db } from '@server/db/database';
import type { Salon } from '@shared/schemas/salon.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { lockStylists } from '../planning';
import { bookingSnapshot } from './booking-snapshot.repository';
import { findSittingById } from './change-booking.repository';

/** Statuses whose sittings may still change chair, basin or times (a held time, a booking, a client checked in). */
const CHANGEABLE = ['held', 'booked', 'checked_in'];

/** The exclusion constraints refuse a chair, basin or hands held twice: said in the desk's words. */
export function takenMeanwhile(err: unknown, message: string): never {
  if ((err as { code?: string }).code === '23P01') throw new AppError('CONFLICT', 409, message);
  throw err;
}

/**
 * A sitting of this salon's booking that may still change, read as its changes need it, with the booking's stylist
 * locked as for any write to the book (inside the caller's transaction): 404 for another salon's booking or a sitting
 * not of it, 409 for a booking that is cancelled, finished or a no-show.
 */
export async function changeableSitting(db: Db, salon: Pick<Salon, 'id'>, bookingId: string, sittingId: string) {
  const before = await bookingSnapshot(db, bookingId);
  if (!before || before.booking.salonId !== salon.id) throw notFound('That booking');
  if (!CHANGEABLE.includes(before.booking.status)) {
    throw new AppError('NOT_BOOKABLE', 409, `A ${before.booking.status.replace('_', ' ')} booking cannot be changed.`);
  }
  await lockStylists(db, [before.booking.stylistId]);
  const sitting = await findSittingById(db, sittingId);
  if (!sitting || sitting.bookingId !== bookingId) throw notFound('That sitting of the booking');
  return { before, sitting };
}
