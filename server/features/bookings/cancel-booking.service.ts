import type { Kysely } from 'kysely';
import type { Database } from '../../db/schema';
import type { Salon } from '../../../shared/schemas/salon.schemas';
import { AppError, notFound } from '../../lib/app-error';
import { writeAudit } from '../audit/audit.repository';
import { bookingSnapshot } from './booking-snapshot.repository';
import { markCancelled, sittingStarts } from './change-booking.repository';
import { replanBookingMessages } from '../messages/plan-messages.service';
import { assertColourBookingsStillAllowed } from './skin-test-dependants';

/**
 * The deposit policy on cancelling: inside the salon's cancellation window before the first sitting the
 * deposit is kept (unless the salon keeps nothing), earlier it is refunded (a 48-hour window is common practice).
 */
export function depositOutcome(depositCents: number, firstStart: Date, now: Date, windowHours: number, keeps: Salon['cancellationKeeps'] = 'deposit'): 'kept' | 'refunded' | null {
  if (depositCents <= 0) return null;
  return keeps === 'deposit' && firstStart.getTime() - now.getTime() < windowHours * 3_600_000 ? 'kept' : 'refunded';
}

export async function cancelBooking(db: Kysely<Database>, salon: Salon, actorUserId: string, bookingId: string, reason: string, now: Date): Promise<void> {
  await db.transaction().execute(async (trx) => {
    const before = await bookingSnapshot(trx, bookingId);
    if (!before || before.row.salon_id !== salon.id) throw notFound('That booking');
    if (!['held', 'booked'].includes(before.row.status)) {
      throw new AppError('NOT_BOOKABLE', 409, `A ${before.row.status.replace('_', ' ')} booking cannot be cancelled.`);
    }
    const [first] = await sittingStarts(trx, bookingId);
    const outcome = depositOutcome(before.row.deposit_cents, first, now, salon.cancellationWindowHours, salon.cancellationKeeps);
    await markCancelled(trx, bookingId, reason, outcome);
    if (before.row.client_id) await assertColourBookingsStillAllowed(trx, salon, before.row.client_id, now);
    const after = await bookingSnapshot(trx, bookingId);
    await writeAudit(trx, { salonId: salon.id, actorUserId, entity: 'booking', entityId: bookingId, action: `cancelled: ${reason}`, before: before.audit, after: after?.audit });
    await replanBookingMessages(trx, bookingId, now, 'cancelled'); // queued reminders dropped, cancellation planned
  });
}
