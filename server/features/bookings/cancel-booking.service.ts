import type { Kysely } from 'kysely';
import type { Database } from '../../db/schema';
import type { Salon } from '../../../shared/schemas/salon.schemas';
import { AppError, notFound } from '../../lib/app-error';
import { writeAudit } from '../audit/audit.repository';
import { bookingSnapshot } from './booking-snapshot.repository';
import { markCancelled, sittingStarts } from './change-booking.repository';
import { replanBookingMessages } from '../messages/plan-messages.service';
import { withColourBookingsKept } from './skin-test-dependants';
import { bookingSkinTestStates } from '../skin-tests/skin-test-check.service';
import type { StepPlan } from '../../../shared/schemas/step-plan.schemas';

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
    const starts = await sittingStarts(trx, bookingId);
    // A booking the client's skin-test record now blocks (a reaction since) is refunded in full: they cannot help it.
    const [skinTest] = await bookingSkinTestStates(trx, salon, [{ clientId: before.row.client_id, status: before.row.status, plan: before.row.step_plan as StepPlan, serviceAsks: before.serviceAsks, starts }], now);
    const outcome = skinTest.status === 'blocked' && before.row.deposit_cents > 0
      ? 'refunded'
      : depositOutcome(before.row.deposit_cents, starts[0], now, salon.cancellationWindowHours, salon.cancellationKeeps);
    const cancel = () => markCancelled(trx, bookingId, reason, outcome);
    if (before.row.client_id) await withColourBookingsKept(trx, salon, before.row.client_id, now, cancel);
    else await cancel();
    const after = await bookingSnapshot(trx, bookingId);
    await writeAudit(trx, { salonId: salon.id, actorUserId, entity: 'booking', entityId: bookingId, action: `cancelled: ${reason}`, before: before.audit, after: after?.audit });
    await replanBookingMessages(trx, bookingId, now, 'cancelled'); // queued reminders dropped, cancellation planned
  });
}
