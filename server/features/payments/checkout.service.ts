import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Payments } from '@server/payments/payments';
import { AppError } from '@server/lib/app-error';
import {
  closeCheckout,
  findCheckout,
  findOpenCheckout,
  insertCheckout,
  setProviderSession,
  type NewStoredCheckout,
  type StoredCheckout,
} from './checkout-sessions.repository';

/** A session about to run out is not handed out: the client needs time on the page. */
const LEAST_TIME_LEFT_MS = 5 * 60_000;
/** How long a second tab waits for the first to get the provider's page before asking (under the same key) itself. */
const WAIT_FOR_FIRST_MS = 15_000;

/**
 * The hosted payment page for this booking and amount: the open one, or a new one. The database keeps one open
 * session per booking and kind (a unique index), and the provider is asked under that row's own idempotency key, so
 * every tab and retry, on any app server, gets the same page, and it can only be paid once. A session for another
 * amount, one about to run out, or one the provider no longer has open is closed and replaced. The amount is always
 * the server's.
 */
export async function openCheckout(db: Kysely<Database>, payments: Payments, want: NewStoredCheckout, now: Date): Promise<string> {
  try {
    return await openOrReuse(db, payments, want, now);
  } catch (err) {
    if (err instanceof AppError) throw err;
    // The SDK has already retried (same idempotency key): the provider is down or not answering.
    console.error(`payments: no payment page for booking ${want.bookingId}: ${(err as Error).message}`);
    throw new AppError('PAYMENTS_UNAVAILABLE', 503, 'The payment service is not answering just now; nothing was charged. Please try again in a moment.');
  }
}

async function openOrReuse(db: Kysely<Database>, payments: Payments, want: NewStoredCheckout, now: Date): Promise<string> {
  for (let attempt = 0; attempt < 4; attempt++) {
    let open = await findOpenCheckout(db, want.bookingId, want.kind);
    // Whoever stores the row asks the provider; the others wait for its answer rather than ask at the same time.
    const mine = !open;
    open ??= await insertCheckout(db, want);
    if (!open) continue; // another request stored one a moment ago: read it
    if (open.amountCents !== want.amountCents || open.expiresAt.getTime() - now.getTime() < LEAST_TIME_LEFT_MS) {
      await retireCheckout(db, payments, open);
      continue;
    }
    if (!open.providerSessionId && !mine) open = await providerSessionOf(db, open);
    if (open.status !== 'open') continue;
    if (open.providerSessionId) {
      const live = await payments.findCheckout(open.providerSessionId);
      // Paid and its webhook not here yet: the same page, which says it is paid and leads back.
      if (live && live.status !== 'expired' && live.url) return live.url;
      await closeCheckout(db, open.id, 'expired');
      continue;
    }
    // Asked under the row's own key: a retry, or a caller that waited in vain for the first, gets the same session.
    const session = await payments
      .createCheckout(
        {
          amountMinor: open.amountCents,
          currency: open.currency,
          description: open.description,
          successUrl: open.successUrl,
          cancelUrl: open.cancelUrl,
          expiresAt: open.expiresAt,
          metadata: { checkout: open.id, booking: open.bookingId, kind: open.kind },
        },
        `checkout:${open.id}`,
      )
      .catch(async (err: unknown) => {
        // The provider keeps a failed answer under its key too: the next try starts a new row, with a new key.
        await closeCheckout(db, open.id, 'expired');
        throw err;
      });
    await setProviderSession(db, open.id, session.id, session.url);
    if (!session.url) throw new AppError('INTERNAL', 502, 'The payment service gave no payment page.');
    return session.url;
  }
  throw new AppError('CONFLICT', 409, 'The payment page changed while it was opened; please try again.');
}

/** The row once the request that stored it has the provider's session, or as it is after WAIT_FOR_FIRST_MS. */
async function providerSessionOf(db: Kysely<Database>, c: StoredCheckout): Promise<StoredCheckout> {
  const until = Date.now() + WAIT_FOR_FIRST_MS;
  let row = c;
  while (!row.providerSessionId && row.status === 'open' && Date.now() < until) {
    await new Promise((r) => setTimeout(r, 100));
    row = (await findCheckout(db, c.id)) ?? { ...row, status: 'expired' };
  }
  return row;
}

/** Closes a session so nobody pays on it: here first (so a new one may open), then at the provider. */
export async function retireCheckout(db: Kysely<Database>, payments: Payments, c: StoredCheckout): Promise<void> {
  if (!(await closeCheckout(db, c.id, 'expired')) || !c.providerSessionId) return;
  // Best effort: a session paid meanwhile still sends its webhook, and a payment nobody owes is refunded then.
  await payments.expireCheckout(c.providerSessionId).catch((err: Error) => console.error(`payments: could not expire ${c.providerSessionId}: ${err.message}`));
}
