import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Payments } from '@server/payments/payments';
import { completeRefund, failRefund, pendingRefunds } from './payments.repository';

/**
 * Asks the provider for refunds Dwell has decided on (written `pending` in the transaction that decided them). Each
 * goes under the idempotency key of its own row, so a retry after a lost answer, a crash or an outage is the same
 * refund, never a second one. What fails stays pending for the next pass (the `make-pending-refunds` job).
 */
export async function makePendingRefunds(db: Kysely<Database>, payments: Payments, ids?: string[]): Promise<number> {
  let made = 0;
  for (const r of await pendingRefunds(db, ids)) {
    if (!r.paymentRef) {
      await failRefund(db, r.id, 'The payment has no provider reference to refund');
      continue;
    }
    try {
      const refund = await payments.refund({ paymentIntentId: r.paymentRef, amountMinor: r.amountCents, metadata: { dwell_refund: r.id } }, `refund:${r.id}`);
      // Its webhook may have completed the row already; either way it is made once.
      await completeRefund(db, r.id, refund.id);
      made++;
    } catch (err) {
      const code = (err as { code?: string }).code;
      // Returned at the provider already (a refund made there first): that refund's own event records it.
      if (code === 'charge_already_refunded') await failRefund(db, r.id, 'Already refunded at the payment provider');
      else console.error(`payments: refund ${r.id} not made yet: ${(err as Error).message}`);
    }
  }
  return made;
}
