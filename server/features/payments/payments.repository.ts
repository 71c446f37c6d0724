import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { PaymentMethod } from '@server/db/schema';

/** A payment in (a deposit, a balance, a tip) or a refund, as the rules that settle and refund it read it. */
export interface StoredPayment {
  id: string;
  salonId: string;
  bookingId: string;
  clientId: string | null;
  kind: 'deposit' | 'balance' | 'refund' | 'tip';
  method: PaymentMethod;
  status: 'pending' | 'succeeded' | 'declined' | 'failed';
  amountCents: number;
  currency: string;
  providerRef: string | null;
}

const PAYMENT_COLUMNS = [
  'id',
  'salon_id as salonId',
  'booking_id as bookingId',
  'client_id as clientId',
  'kind',
  'method',
  'status',
  'amount_cents as amountCents',
  'currency',
  'provider_ref as providerRef',
] as const;

/** A payment in as it is written: taken (succeeded), by card through the provider or at the desk. */
interface NewPayment {
  salonId: string;
  bookingId: string;
  clientId: string | null;
  kind: 'deposit' | 'balance';
  method: PaymentMethod;
  amountCents: number;
  currency: string;
  providerRef?: string;
  providerSessionId?: string;
  recordedBy?: string;
  note?: string;
}

const paymentRow = (p: NewPayment) => ({
  salon_id: p.salonId,
  booking_id: p.bookingId,
  client_id: p.clientId,
  kind: p.kind,
  method: p.method,
  amount_cents: p.amountCents,
  currency: p.currency,
  provider_ref: p.providerRef ?? null,
  provider_session_id: p.providerSessionId ?? null,
  recorded_by: p.recordedBy ?? null,
  status: 'succeeded' as const,
  message: p.note ?? '',
});

/**
 * A card payment made on a hosted page, once: the provider's payment and the session it came through are each
 * unique, so a second event about the same payment inserts nothing and answers null.
 */
export async function insertCardPayment(db: Db, p: Omit<NewPayment, 'method'> & { providerRef: string; providerSessionId: string }): Promise<string | null> {
  const row = await db
    .insertInto('payments')
    .values(paymentRow({ ...p, method: 'card' }))
    .onConflict((oc) => oc.doNothing())
    .returning('id')
    .executeTakeFirst();
  return row?.id ?? null;
}

/** A deposit taken at the desk, in cash or on the salon's card terminal, with who took it. */
export async function insertDeskPayment(db: Db, p: Omit<NewPayment, 'kind' | 'providerRef' | 'providerSessionId'> & { recordedBy: string }): Promise<string> {
  const row = await db
    .insertInto('payments')
    .values(paymentRow({ ...p, kind: 'deposit' }))
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function findPaymentByProviderRef(db: Db, providerRef: string): Promise<StoredPayment | undefined> {
  return db
    .selectFrom('payments')
    .select(PAYMENT_COLUMNS)
    .where('provider_ref', '=', providerRef)
    .where('status', 'in', ['pending', 'succeeded'])
    .executeTakeFirst();
}

/** The payment, locked until the transaction ends: every decision to refund some of it is made one at a time. */
export async function lockPayment(db: Db, id: string): Promise<StoredPayment> {
  return db.selectFrom('payments').select(PAYMENT_COLUMNS).where('id', '=', id).forUpdate().executeTakeFirstOrThrow();
}

/** What of a payment has gone back or is on its way back. */
export async function refundedOf(db: Db, paymentId: string): Promise<number> {
  const row = await db
    .selectFrom('payments')
    .select(sql<string>`coalesce(sum(amount_cents), 0)`.as('sum'))
    .where('refund_of', '=', paymentId)
    .where('status', 'in', ['pending', 'succeeded'])
    .executeTakeFirstOrThrow();
  return Number(row.sum);
}

/**
 * A refund of (part of) a payment: `pending` when Dwell decided it and still has to ask the provider, `succeeded`
 * with the provider's refund when it was made at the provider.
 */
export async function insertRefund(
  db: Db,
  r: { of: StoredPayment; amountCents: number; status: 'pending' | 'succeeded'; providerRef: string | null; message: string; recordedBy?: string | null },
): Promise<string> {
  const row = await db
    .insertInto('payments')
    .values({
      salon_id: r.of.salonId,
      booking_id: r.of.bookingId,
      client_id: r.of.clientId,
      kind: 'refund',
      // Money goes back the way it came: a cash payment in cash, a card payment to the card.
      method: r.of.method,
      refund_of: r.of.id,
      recorded_by: r.recordedBy ?? null,
      amount_cents: r.amountCents,
      currency: r.of.currency,
      provider_ref: r.providerRef,
      status: r.status,
      message: r.message,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** The provider made a refund Dwell asked for; false when that refund row was not waiting for it. */
export async function completeRefund(db: Db, id: string, providerRef: string): Promise<boolean> {
  const res = await db
    .updateTable('payments')
    .set({ status: 'succeeded', provider_ref: providerRef })
    .where('id', '=', id)
    .where('kind', '=', 'refund')
    .where('status', '=', 'pending')
    .executeTakeFirst();
  return Number(res.numUpdatedRows) === 1;
}

/** A refund the provider will not make (the payment was refunded there already): it moved nothing. */
export async function failRefund(db: Db, id: string, message: string): Promise<void> {
  await db.updateTable('payments').set({ status: 'failed', message }).where('id', '=', id).where('status', '=', 'pending').execute();
}

/** Refunds decided and not made yet, oldest first, with the provider's payment each returns. */
export async function pendingRefunds(db: Db, ids?: string[], limit = 50): Promise<{ id: string; amountCents: number; paymentRef: string | null }[]> {
  if (ids?.length === 0) return [];
  let q = db
    .selectFrom('payments as r')
    .innerJoin('payments as p', 'p.id', 'r.refund_of')
    .select(['r.id', 'r.amount_cents as amountCents', 'p.provider_ref as paymentRef'])
    .where('r.kind', '=', 'refund')
    .where('r.status', '=', 'pending');
  if (ids) q = q.where('r.id', 'in', ids);
  return q.orderBy('r.created_at').limit(limit).execute();
}

/** Every payment in of a booking (deposit, balance, tip), oldest first, with what of each has gone back or is on its way back. */
export async function bookingPayments(db: Db, bookingId: string) {
  return db
    .selectFrom('payments as p')
    .leftJoin('users as u', 'u.id', 'p.recorded_by')
    .leftJoin('staff as s', 's.id', 'p.staff_id')
    .select([
      'p.id',
      'p.kind',
      'p.method',
      'p.amount_cents as amountCents',
      'p.currency',
      'p.provider_ref as providerRef',
      'p.created_at as at',
      'u.name as byName',
      's.display_name as stylistName',
      sql<string>`(select coalesce(sum(r.amount_cents), 0) from payments r where r.refund_of = p.id and r.status in ('pending', 'succeeded'))`.as(
        'refundedCents',
      ),
    ])
    .where('p.booking_id', '=', bookingId)
    .where('p.kind', '<>', 'refund')
    .where('p.status', '=', 'succeeded')
    .orderBy('p.created_at')
    .execute();
}

/** Every refund of a booking, oldest first, with the payment it returns, its reason and who made it at the desk. */
export async function bookingRefunds(db: Db, bookingId: string) {
  return db
    .selectFrom('payments as r')
    .innerJoin('payments as p', 'p.id', 'r.refund_of')
    .leftJoin('users as u', 'u.id', 'r.recorded_by')
    .select([
      'r.id',
      'r.refund_of as refundOf',
      'p.kind as ofKind',
      'r.method',
      'r.amount_cents as amountCents',
      'r.status',
      'r.message as reason',
      'r.created_at as at',
      'u.name as byName',
    ])
    .where('r.booking_id', '=', bookingId)
    .where('r.kind', '=', 'refund')
    .where('r.status', 'in', ['pending', 'succeeded'])
    .orderBy('r.created_at')
    .execute();
}

/** Every movement of a booking's deposit money, oldest first, with the name of whoever took it at the desk. */
export async function depositMovements(db: Db, bookingId: string) {
  return db
    .selectFrom('payments as p')
    .leftJoin('payments as of', 'of.id', 'p.refund_of')
    .leftJoin('users as u', 'u.id', 'p.recorded_by')
    .select([
      'p.id',
      'p.kind',
      'p.method',
      'p.amount_cents as amountCents',
      'p.status',
      'p.provider_ref as providerRef',
      'p.provider_session_id as providerSessionId',
      'of.provider_ref as refundOfRef',
      'p.created_at as at',
      'u.name as byName',
      'p.message as note',
    ])
    .where('p.booking_id', '=', bookingId)
    .where((eb) => eb.or([eb('p.kind', '=', 'deposit'), eb('of.kind', '=', 'deposit')]))
    .where('p.status', 'in', ['pending', 'succeeded'])
    .orderBy('p.created_at')
    .execute();
}
