import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Db } from '@server/db/database';
import type { Salon } from '@shared/schemas/salon.schemas';
import type { CancelTerms } from '@shared/schemas/online-booking.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { bookingSnapshot, type BookingSnapshot } from './booking-snapshot.repository';
import { auditBookingChange } from './booking-audit.service';
import { markCancelled, sittingStarts } from './change-booking.repository';
import { replanBookingMessages } from '../messages';
import { withColourBookingsKept } from './skin-test-dependants';
import { bookingSkinTestStates } from '../skin-tests';
import { formatMoney } from '@shared/money/money';
import { lockBookingForMoney, settleDepositOutcome } from '../payments';

/**
 * The deposit policy on cancelling: inside the salon's cancellation window before the first sitting the
 * deposit is kept (unless the salon keeps nothing), earlier it is refunded (a 48-hour window is common practice).
 */
export function depositOutcome(
  depositCents: number,
  firstStart: Date,
  now: Date,
  windowHours: number,
  keeps: Salon['cancellationKeeps'] = 'deposit',
): 'kept' | 'refunded' | null {
  if (depositCents <= 0) return null;
  return keeps === 'deposit' && firstStart.getTime() - now.getTime() < windowHours * 3_600_000 ? 'kept' : 'refunded';
}

export type CancelWhy = CancelTerms['why'];

/** Why a cancellation kept or refunded the deposit, as its money's history line says it. */
const CANCEL_WHY_WORDS: Record<CancelWhy, string> = {
  no_deposit: 'no deposit',
  not_paid: 'not paid',
  skin_test_blocked: "cancelled: the client's skin-test record no longer allows this colour",
  salon_keeps_nothing: 'cancelled: the salon refunds deposits on every cancellation',
  inside_window: "cancelled inside the salon's cancellation window",
  outside_window: "cancelled outside the salon's cancellation window",
};

/**
 * What cancelling now does to the deposit, and why: the one rule behind the cancel itself and the terms the desk
 * and the client read before confirming. A hold has no deposit paid yet; a booking the client's skin-test record
 * now blocks (a reaction since) is refunded in full, as they cannot help it; else the cancellation window decides.
 */
async function outcomeOf(db: Db, salon: Salon, before: BookingSnapshot, bookingId: string, now: Date) {
  const { booking } = before;
  if (!['held', 'booked'].includes(booking.status)) {
    throw new AppError('NOT_BOOKABLE', 409, `A ${booking.status.replace('_', ' ')} booking cannot be cancelled.`);
  }
  const starts = await sittingStarts(db, bookingId);
  const terms = (outcome: 'kept' | 'refunded' | null, why: CancelWhy, skinTest = '') => ({ outcome, why, starts, skinTest });
  if (booking.depositCents <= 0) return terms(null, 'no_deposit');
  if (booking.status === 'held') return terms(null, 'not_paid');
  const states = await bookingSkinTestStates(
    db,
    salon,
    [{ clientId: booking.clientId, status: booking.status, plan: booking.stepPlan, serviceAsks: before.serviceAsks, starts }],
    now,
  );
  const skinTest = states[0]!; // one state per footing asked about
  if (skinTest.status === 'blocked') return terms('refunded', 'skin_test_blocked', skinTest.message);
  if (salon.cancellationKeeps === 'nothing') return terms('refunded', 'salon_keeps_nothing');
  const outcome = depositOutcome(booking.depositCents, starts[0]!, now, salon.cancellationWindowHours, salon.cancellationKeeps);
  return terms(outcome, outcome === 'kept' ? 'inside_window' : 'outside_window');
}

/** The outcome in the desk's words: the amount, kept or refunded, and the rule that decided it. */
function deskWords(salon: Salon, depositCents: number, why: CancelWhy, skinTest: string): string {
  const amount = formatMoney(depositCents, salon.currency);
  const hours = salon.cancellationWindowHours;
  switch (why) {
    case 'no_deposit':
      return 'There is no deposit on this booking.';
    case 'not_paid':
      return `This time is held online and its ${amount} deposit is not paid yet: there is nothing to keep or refund.`;
    case 'skin_test_blocked':
      return `The ${amount} deposit is refunded in full: the client's skin-test record no longer allows this colour, which they cannot help. ${skinTest}`.trim();
    case 'salon_keeps_nothing':
      return `The ${amount} deposit is refunded: the salon refunds deposits whenever a booking is cancelled.`;
    case 'inside_window':
      return `The ${amount} deposit is kept: the first sitting is less than ${hours} hours away, inside the salon's ${hours}-hour cancellation window.`;
    case 'outside_window':
      return `The ${amount} deposit is refunded: the first sitting is more than ${hours} hours away, outside the salon's ${hours}-hour cancellation window.`;
  }
}

/** What cancelling this booking now would do to its deposit and why (the caller words it for its reader). */
export async function cancelOutcome(db: Db, salon: Salon, bookingId: string, now: Date) {
  const before = await bookingSnapshot(db, bookingId);
  if (!before || before.booking.salonId !== salon.id) throw notFound('That booking');
  return { ...(await outcomeOf(db, salon, before, bookingId, now)), depositCents: before.booking.depositCents };
}

/** The terms the desk reads before confirming a cancellation. */
export async function deskCancelTerms(db: Db, salon: Salon, bookingId: string, now: Date): Promise<CancelTerms> {
  const { outcome, why, skinTest, depositCents } = await cancelOutcome(db, salon, bookingId, now);
  return { depositOutcome: outcome, why, message: deskWords(salon, depositCents, why, skinTest) };
}

/**
 * Cancels with a reason; the deposit policy decides kept or refunded, and the payments feature moves the money in the
 * same transaction (a refund made to the card after the commit: `makeDecidedRefunds`). The booking is locked first,
 * so a second cancel at the same moment finds it cancelled and moves nothing. `nothingPaid`: a booking released
 * because its deposit was never paid, so there is no deposit to keep or refund.
 */
export async function cancelBooking(
  db: Kysely<Database>,
  salon: Salon,
  actorUserId: string | null,
  bookingId: string,
  reason: string,
  now: Date,
  options: { nothingPaid?: boolean } = {},
): Promise<void> {
  await db.transaction().execute(async (trx) => {
    await lockBookingForMoney(trx, bookingId);
    const before = await bookingSnapshot(trx, bookingId);
    if (!before || before.booking.salonId !== salon.id) throw notFound('That booking');
    const { outcome, why } = await outcomeOf(trx, salon, before, bookingId, now);
    const decided = options.nothingPaid ? null : outcome;
    const cancel = () => markCancelled(trx, bookingId, reason, decided);
    if (before.booking.clientId) await withColourBookingsKept(trx, salon, before.booking.clientId, now, cancel);
    else await cancel();
    await auditBookingChange(trx, { salonId: salon.id, actorUserId, bookingId, action: `cancelled: ${reason}`, before: before.audit });
    await settleDepositOutcome(trx, { bookingId, outcome: decided, actorUserId, why: CANCEL_WHY_WORDS[why] });
    await replanBookingMessages(trx, bookingId, now, 'cancelled'); // queued reminders dropped, cancellation planned
  });
}
