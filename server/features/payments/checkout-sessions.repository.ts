import type { Selectable } from 'kysely';
import type { Db } from '@server/db/database';
import type { CheckoutSessionsTable } from '@server/db/schema';

/** A hosted payment session Dwell opened, as stored: what it asks for, and where the client pays and returns. */
export interface StoredCheckout {
  id: string;
  salonId: string;
  bookingId: string;
  clientId: string | null;
  kind: 'deposit' | 'balance';
  amountCents: number;
  currency: string;
  description: string;
  successUrl: string;
  cancelUrl: string;
  providerSessionId: string | null;
  url: string | null;
  status: 'open' | 'completed' | 'expired';
  expiresAt: Date;
}

export type NewStoredCheckout = Omit<StoredCheckout, 'id' | 'providerSessionId' | 'url' | 'status'>;

const toCheckout = (r: Selectable<CheckoutSessionsTable>): StoredCheckout => ({
  id: r.id,
  salonId: r.salon_id,
  bookingId: r.booking_id,
  clientId: r.client_id,
  kind: r.kind,
  amountCents: r.amount_cents,
  currency: r.currency,
  description: r.description,
  successUrl: r.success_url,
  cancelUrl: r.cancel_url,
  providerSessionId: r.provider_session_id,
  url: r.url,
  status: r.status,
  expiresAt: r.expires_at,
});

export async function findOpenCheckout(db: Db, bookingId: string, kind: StoredCheckout['kind']): Promise<StoredCheckout | undefined> {
  const row = await db
    .selectFrom('checkout_sessions')
    .selectAll()
    .where('booking_id', '=', bookingId)
    .where('kind', '=', kind)
    .where('status', '=', 'open')
    .executeTakeFirst();
  return row && toCheckout(row);
}

export async function findCheckout(db: Db, id: string): Promise<StoredCheckout | undefined> {
  const row = await db.selectFrom('checkout_sessions').selectAll().where('id', '=', id).executeTakeFirst();
  return row && toCheckout(row);
}

/** Stores a new open session; undefined when another request stored one for this booking and kind a moment ago. */
export async function insertCheckout(db: Db, c: NewStoredCheckout): Promise<StoredCheckout | undefined> {
  const row = await db
    .insertInto('checkout_sessions')
    .values({
      salon_id: c.salonId,
      booking_id: c.bookingId,
      client_id: c.clientId,
      kind: c.kind,
      amount_cents: c.amountCents,
      currency: c.currency,
      description: c.description,
      success_url: c.successUrl,
      cancel_url: c.cancelUrl,
      expires_at: c.expiresAt,
      provider_session_id: null,
      url: null,
    })
    .onConflict((oc) => oc.columns(['booking_id', 'kind']).where('status', '=', 'open').doNothing())
    .returningAll()
    .executeTakeFirst();
  return row && toCheckout(row);
}

/** The provider's session for a stored one; the first answer is kept (every caller got the same session). */
export async function setProviderSession(db: Db, id: string, providerSessionId: string, url: string | null): Promise<void> {
  await db
    .updateTable('checkout_sessions')
    .set({ provider_session_id: providerSessionId, url })
    .where('id', '=', id)
    .where('provider_session_id', 'is', null)
    .execute();
}

/** An open session is paid (completed) or can no longer be paid (expired); one already closed stays as it is. */
export async function closeCheckout(db: Db, id: string, status: 'completed' | 'expired'): Promise<boolean> {
  const res = await db.updateTable('checkout_sessions').set({ status }).where('id', '=', id).where('status', '=', 'open').executeTakeFirst();
  return Number(res.numUpdatedRows) === 1;
}

/** A paid session is completed even when it had been closed meanwhile: the money came through it. */
export async function markCheckoutPaid(db: Db, id: string): Promise<void> {
  await db.updateTable('checkout_sessions').set({ status: 'completed' }).where('id', '=', id).execute();
}

export async function findCheckoutByProviderId(db: Db, providerSessionId: string): Promise<StoredCheckout | undefined> {
  const row = await db.selectFrom('checkout_sessions').selectAll().where('provider_session_id', '=', providerSessionId).executeTakeFirst();
  return row && toCheckout(row);
}

/**
 * Open sessions nobody should pay on any more: their booking is gone (a lapsed hold) or no longer asks for anything
 * (cancelled, or the deposit was taken at the desk; a balance page stays open until its checkout is paid, after which
 * the booking is checked out). The sweep closes them at the provider too.
 */
export async function staleOpenCheckouts(db: Db, limit = 50): Promise<StoredCheckout[]> {
  const rows = await db
    .selectFrom('checkout_sessions as c')
    .leftJoin('bookings as b', 'b.id', 'c.booking_id')
    .selectAll('c')
    .where('c.status', '=', 'open')
    .where((eb) =>
      eb.or([
        eb('b.id', 'is', null),
        eb('b.status', 'not in', ['held', 'booked', 'checked_in', 'finished']),
        eb.and([
          eb('c.kind', '=', 'deposit'),
          eb(
            'b.deposit_cents',
            '<=',
            eb
              .selectFrom('payments as p')
              .select((p) => p.fn.coalesce(p.fn.sum<number>('p.amount_cents'), p.lit(0)).as('paid'))
              .whereRef('p.booking_id', '=', 'c.booking_id')
              .where('p.kind', '=', 'deposit')
              .where('p.status', '=', 'succeeded'),
          ),
        ]),
      ]),
    )
    .limit(limit)
    .execute();
  return rows.map(toCheckout);
}

/** The provider expired a session (its time ran out, or Dwell closed it): no payment can come through it now. */
export async function expireStoredCheckout(db: Db, providerSessionId: string): Promise<void> {
  await db
    .updateTable('checkout_sessions')
    .set({ status: 'expired' })
    .where('provider_session_id', '=', providerSessionId)
    .where('status', '=', 'open')
    .execute();
}
