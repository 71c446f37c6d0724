import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Payments } from '@server/payments/payments';
import { formatDateTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { cancelBooking } from '../bookings';
import { findSalon } from '../salon';
import { bookingsPastDepositDue } from './booking-money.repository';
import { staleOpenCheckouts } from './checkout-sessions.repository';
import { retireCheckout } from './checkout.service';

/*
 * Background passes over money (server/jobs/app-jobs.ts runs them every minute). Each is idempotent: what one pass
 * did, the next finds done.
 */

/**
 * Desk bookings whose deposit is still unpaid at the time the salon's setting fixed when they were made are
 * released: cancelled with the reason, the time free again, the client told by the cancellation message. Nothing was
 * paid, so there is no deposit to keep or refund.
 */
export async function releaseUnpaidDeposits(db: Kysely<Database>, now: Date): Promise<number> {
  let released = 0;
  for (const due of await bookingsPastDepositDue(db, now)) {
    const salon = await findSalon(db, due.salonId);
    const by = formatDateTime(due.dueBy, formatFor(salon.timeZone), { year: false });
    try {
      await cancelBooking(db, salon, null, due.id, `Released: the deposit was not paid by ${by}`, now, { nothingPaid: true });
      released++;
    } catch (err) {
      // Changed meanwhile (cancelled, arrived): the next pass reads it afresh.
      console.error(`payments: booking ${due.id} not released: ${(err as Error).message}`);
    }
  }
  return released;
}

/** Payment pages nobody should pay on any more (the hold lapsed, the booking was cancelled, the deposit was taken) are closed. */
export async function closeStaleCheckouts(db: Kysely<Database>, payments: Payments): Promise<number> {
  const stale = await staleOpenCheckouts(db);
  for (const c of stale) await retireCheckout(db, payments, c);
  return stale.length;
}
