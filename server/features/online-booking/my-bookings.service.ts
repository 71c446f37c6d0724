import type { Kysely } from 'kysely';
import type { Database } from '../../db/schema';
import type { SessionUser } from '../../../shared/schemas/auth.schemas';
import { DateTime } from 'luxon';
import { AppError, notFound } from '../../lib/app-error';
import { findSalon } from '../salon/salon.repository';
import { findClientIdForUser } from '../clients/clients.repository';
import { findService } from '../services/services.repository';
import { cancelOutcome, depositOutcome } from '../bookings/cancel-booking.service';
import type { CancelTerms } from '../../../shared/schemas/online-booking.schemas';
import { findHold } from './holds.repository';
import { formatMoney } from '../../../shared/money/money';

/** One of the signed-in client's own bookings; anyone else's is answered as not found. */
export async function ownBooking(db: Kysely<Database>, user: SessionUser, id: string) {
  const [hold, clientId] = await Promise.all([findHold(db, id), findClientIdForUser(db, user.id)]);
  if (!hold || !clientId || hold.client_id !== clientId) throw notFound('That booking');
  const salon = await findSalon(db, hold.salon_id);
  return { hold, salon };
}

/**
 * What cancelling now means for the deposit, in words the client reads before confirming: the same rule the cancel
 * applies (cancel-booking.service), so a booking their skin-test record blocks reads as refunded in full.
 */
export async function cancelTerms(db: Kysely<Database>, user: SessionUser, id: string, now: Date): Promise<CancelTerms> {
  const { hold, salon } = await ownBooking(db, user, id);
  if (hold.status !== 'booked') throw new AppError('NOT_BOOKABLE', 409, 'Only booked appointments can be cancelled here.');
  const { outcome, why, depositCents } = await cancelOutcome(db, salon, id, now);
  const amount = formatMoney(depositCents, salon.currency);
  const words: Record<CancelTerms['why'], string> = {
    no_deposit: 'There is no deposit on this appointment.',
    not_paid: 'Your deposit has not been paid yet, so there is nothing to refund.',
    skin_test_blocked: `Your skin-test record no longer allows this colour, so the ${amount} deposit is refunded in full.`,
    salon_keeps_nothing: `The salon refunds the ${amount} deposit whenever you cancel.`,
    inside_window: `Your appointment is less than ${salon.cancellationWindowHours} hours away, so the ${amount} deposit is kept if you cancel now.`,
    outside_window: `You are cancelling more than ${salon.cancellationWindowHours} hours ahead, so the ${amount} deposit is refunded.`,
  };
  return { depositOutcome: outcome, why, message: words[why] };
}

/** A client may move only one-sitting appointments themselves; longer work is moved with the salon. */
export async function assertClientMovable(db: Kysely<Database>, user: SessionUser, id: string, now: Date) {
  const { hold, salon } = await ownBooking(db, user, id);
  const service = await findService(db, salon.id, hold.service_id);
  if (!service || service.stepPlan.sittings.length !== 1) throw new AppError('NOT_BOOKABLE', 409, 'Please call the salon to move an appointment with several sittings.');
  if (hold.status !== 'booked') throw new AppError('NOT_BOOKABLE', 409, 'Only booked appointments can be moved.');
  if (hold.start <= now) throw new AppError('NOT_BOOKABLE', 409, 'This appointment has already started.');
  return { hold, salon, service, startsIn: DateTime.fromJSDate(hold.start).diff(DateTime.fromJSDate(now), 'hours').hours };
}

/** A time inside the cancellation window of a booking with a deposit (where the deposit would be kept). */
export function insideDepositWindow(depositCents: number, start: Date, now: Date, windowHours: number): boolean {
  return depositOutcome(depositCents, start, now, windowHours) === 'kept';
}
