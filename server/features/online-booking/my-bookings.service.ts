import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import { DateTime } from 'luxon';
import { AppError, notFound } from '@server/lib/app-error';
import { findSalon } from '../salon';
import { findClientIdForUser } from '../clients';
import { findService } from '../services';
import { cancelBooking, cancelOutcome, depositOutcome } from '../bookings';
import { moveSitting } from '../bookings';
import { deskBookingView } from '../bookings';
import type { Availability, CancelTerms } from '@shared/schemas/online-booking.schemas';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import { findHold } from './holds.repository';
import { bookingIcs } from './booking-ics';
import { freeTimes } from './availability.service';
import { searchedSalon } from './free-times.service';
import { formatMoney } from '@shared/money/money';

/** One of the signed-in client's own bookings; anyone else's is answered as not found. */
export async function ownBooking(db: Kysely<Database>, user: SessionUser, id: string) {
  const [hold, clientId] = await Promise.all([findHold(db, id), findClientIdForUser(db, user.id)]);
  if (!hold || !clientId || hold.clientId !== clientId) throw notFound('That booking');
  const salon = await findSalon(db, hold.salonId);
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
  const service = await findService(db, salon.id, hold.serviceId);
  if (!service || service.stepPlan.sittings.length !== 1)
    throw new AppError('NOT_BOOKABLE', 409, 'Please call the salon to move an appointment with several sittings.');
  if (hold.status !== 'booked') throw new AppError('NOT_BOOKABLE', 409, 'Only booked appointments can be moved.');
  if (hold.start <= now) throw new AppError('NOT_BOOKABLE', 409, 'This appointment has already started.');
  return { hold, salon, service, startsIn: DateTime.fromJSDate(hold.start).diff(DateTime.fromJSDate(now), 'hours').hours };
}

/** A time inside the cancellation window of a booking with a deposit (where the deposit would be kept). */
export function insideDepositWindow(depositCents: number, start: Date, now: Date, windowHours: number): boolean {
  return depositOutcome(depositCents, start, now, windowHours) === 'kept';
}

/** One of the client's bookings as a calendar file (RFC 5545): its first sitting, at the salon. */
export async function myBookingCalendarFile(db: Kysely<Database>, user: SessionUser, id: string): Promise<string> {
  const { hold, salon } = await ownBooking(db, user, id);
  return bookingIcs({
    uid: `${hold.id}@dwell`,
    title: `${hold.serviceName} at ${salon.name}`,
    description: `${hold.serviceName} with ${hold.stylistName}`,
    location: salon.address,
    start: hold.start,
    end: hold.end,
  });
}

/** The client cancels their own booking; the deposit policy decides as at the desk. */
export async function cancelMyBooking(db: Kysely<Database>, user: SessionUser, id: string, reason: string, now: Date): Promise<BookingView> {
  const { salon } = await ownBooking(db, user, id);
  await cancelBooking(db, salon, user.id, id, reason, now);
  return deskBookingView(db, salon.id, salon.timeZone, id);
}

/**
 * Free times to move the client's own booking to. A deposit stays refundable only outside the cancellation window, so
 * a client's own move never lands inside it; and the appointment's own time is no move at all (the search leaves the
 * booking out, so finds it free).
 */
export async function myMoveTimes(db: Kysely<Database>, user: SessionUser, id: string, from: string | undefined, now: Date): Promise<Availability> {
  const { salon, service, hold } = await assertClientMovable(db, user, id, now);
  const times = await freeTimes(db, searchedSalon(salon), service, hold.stylistId, from, now, id);
  const elsewhere = (start: Date) => start.getTime() !== hold.start.getTime();
  return {
    ...times,
    times: times.times.filter(
      (t) => elsewhere(new Date(t.start)) && !insideDepositWindow(hold.depositCents, new Date(t.start), now, salon.cancellationWindowHours),
    ),
  };
}

/** The client moves their own booking (one sitting), never into the cancellation window of its deposit. */
export async function moveMyBooking(db: Kysely<Database>, user: SessionUser, id: string, start: Date, now: Date): Promise<BookingView> {
  const { salon, hold } = await assertClientMovable(db, user, id, now);
  if (insideDepositWindow(hold.depositCents, start, now, salon.cancellationWindowHours)) {
    throw new AppError(
      'NOT_BOOKABLE',
      409,
      `Times less than ${salon.cancellationWindowHours} hours away would make your deposit non-refundable; please call the salon to move this close.`,
    );
  }
  await moveSitting(db, salon, user.id, { bookingId: id, sitting: 1, start }, now);
  return deskBookingView(db, salon.id, salon.timeZone, id);
}
