import type { Db } from '@server/db/database';
import type { PaymentMethod } from '@server/db/schema';
import type { BookingStatus } from '@shared/schemas/common.schemas';
import type { SittingStatus } from '@shared/schemas/day-of-service.schemas';
import type { Checkout } from '@shared/money/checkout';

/** What a visit's checkout is worked out from: the booking, its service, who worked on it, the salon's tax. */
export interface VisitFacts {
  bookingId: string;
  salonId: string;
  status: BookingStatus;
  salonName: string;
  currency: string;
  taxRateMilliPercent: number;
  taxInclusive: boolean;
  clientId: string | null;
  clientName: string;
  clientEmail: string | null;
  serviceName: string;
  /** The menu's price; a "from" price's start when `priceIsFrom`. */
  menuCents: number;
  priceIsFrom: boolean;
  /** What the booking was made at: the quote's price when booked from one, else the menu's. */
  bookedCents: number;
  sittingStatuses: SittingStatus[];
  /** The booking's stylist first, then anyone else who had a step, in the order of their first step. */
  stylists: { id: string; name: string }[];
}

export async function visitFacts(db: Db, salonId: string, bookingId: string): Promise<VisitFacts | undefined> {
  const row = await db
    .selectFrom('bookings as b')
    .innerJoin('salons as sa', 'sa.id', 'b.salon_id')
    .innerJoin('services as sv', 'sv.id', 'b.service_id')
    .leftJoin('clients as c', 'c.id', 'b.client_id')
    .select([
      'b.id',
      'b.salon_id as salonId',
      'b.stylist_id as stylistId',
      'b.status',
      'b.client_id as clientId',
      'b.price_cents as bookedCents',
      'sa.name as salonName',
      'sa.currency',
      'sa.tax_rate_milli_percent as taxRate',
      'sa.tax_inclusive as taxInclusive',
      'c.name as clientName',
      'c.email as clientEmail',
      'sv.name as serviceName',
      'sv.price_cents as menuCents',
      'sv.price_is_from as priceIsFrom',
    ])
    .where('b.id', '=', bookingId)
    .where('b.salon_id', '=', salonId)
    .executeTakeFirst();
  if (!row) return undefined;
  const sittings = await db.selectFrom('sittings').select('status').where('booking_id', '=', bookingId).orderBy('seq').execute();
  const steps = await db
    .selectFrom('booking_steps as st')
    .innerJoin('sittings as si', 'si.id', 'st.sitting_id')
    .innerJoin('staff as s', 's.id', 'st.stylist_id')
    .select(['s.id', 's.display_name as name'])
    .where('si.booking_id', '=', bookingId)
    .orderBy('si.seq')
    .orderBy('st.seq')
    .execute();
  const lead = await db.selectFrom('staff').select(['id', 'display_name as name']).where('id', '=', row.stylistId).executeTakeFirstOrThrow();
  const stylists = [lead, ...steps].filter((s, i, all) => all.findIndex((o) => o.id === s.id) === i);
  return {
    bookingId: row.id,
    salonId: row.salonId,
    status: row.status,
    salonName: row.salonName,
    currency: row.currency,
    taxRateMilliPercent: row.taxRate,
    taxInclusive: row.taxInclusive,
    clientId: row.clientId,
    clientName: row.clientName ?? 'Client',
    clientEmail: row.clientEmail,
    serviceName: row.serviceName,
    menuCents: row.menuCents,
    priceIsFrom: row.priceIsFrom,
    bookedCents: row.bookedCents,
    sittingStatuses: sittings.map((s) => s.status),
    stylists,
  };
}

/** A visit's checkout as stored. */
export interface StoredDeskCheckout {
  id: string;
  salonId: string;
  bookingId: string;
  currency: string;
  receipt: Checkout;
  status: 'open' | 'paid';
  /** What was left to pay after the deposit, tip included. */
  dueCents: number;
  createdAt: Date;
  paidAt: Date | null;
}

const COLUMNS = [
  'id',
  'salon_id as salonId',
  'booking_id as bookingId',
  'currency',
  'receipt',
  'status',
  'due_cents as dueCents',
  'created_at as createdAt',
  'paid_at as paidAt',
] as const;

const toStored = (r: Omit<StoredDeskCheckout, 'receipt'> & { receipt: unknown }): StoredDeskCheckout => ({ ...r, receipt: r.receipt as Checkout });

/** The booking's checkout; `lock` keeps it until the transaction ends (the card part's webhook and the desk one at a time). */
export async function findDeskCheckout(db: Db, bookingId: string, lock = false): Promise<StoredDeskCheckout | undefined> {
  let q = db.selectFrom('checkouts').select(COLUMNS).where('booking_id', '=', bookingId);
  if (lock) q = q.forUpdate();
  const row = await q.executeTakeFirst();
  return row && toStored(row);
}

/** Stores the checkout; a second one of the same visit breaks `checkouts_booking_id_key` (a 409). */
export async function insertDeskCheckout(db: Db, c: { salonId: string; bookingId: string; receipt: Checkout; createdBy: string }): Promise<string> {
  const r = c.receipt;
  const row = await db
    .insertInto('checkouts')
    .values({
      salon_id: c.salonId,
      booking_id: c.bookingId,
      currency: r.currency,
      receipt: JSON.stringify(r),
      subtotal_cents: r.subtotalCents,
      discount_cents: r.discountCents,
      tax_cents: r.taxCents,
      total_cents: r.totalCents,
      deposit_applied_cents: r.depositPaidCents,
      tip_cents: r.tipCents,
      due_cents: r.toPayCents,
      created_by: c.createdBy,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

export async function markDeskCheckoutPaid(db: Db, id: string, at: Date): Promise<void> {
  await db.updateTable('checkouts').set({ status: 'paid', paid_at: at }).where('id', '=', id).execute();
}

export async function setBookingCheckedOut(db: Db, bookingId: string): Promise<void> {
  await db.updateTable('bookings').set({ status: 'checked_out' }).where('id', '=', bookingId).execute();
}

interface CheckoutMoney {
  salonId: string;
  bookingId: string;
  clientId: string | null;
  checkoutId: string;
  currency: string;
  method: PaymentMethod;
  recordedBy: string | null;
}

const moneyRow = (m: CheckoutMoney) => ({
  salon_id: m.salonId,
  booking_id: m.bookingId,
  client_id: m.clientId,
  checkout_id: m.checkoutId,
  currency: m.currency,
  method: m.method,
  recorded_by: m.recordedBy,
  status: 'succeeded' as const,
  message: '',
});

/** The balance taken at the desk (in cash) at this checkout. */
export async function insertBalancePayment(db: Db, m: CheckoutMoney, amountCents: number): Promise<void> {
  await db
    .insertInto('payments')
    .values({ ...moneyRow(m), kind: 'balance', amount_cents: amountCents })
    .execute();
}

/** One tip row per stylist who shares it (a share of nothing is no row). */
export async function insertTipPayments(db: Db, m: CheckoutMoney, shares: { stylistId: string; cents: number }[]): Promise<void> {
  const rows = shares.filter((s) => s.cents > 0).map((s) => ({ ...moneyRow(m), kind: 'tip' as const, staff_id: s.stylistId, amount_cents: s.cents }));
  if (rows.length > 0) await db.insertInto('payments').values(rows).execute();
}

/**
 * The card part's payment, recorded from the webhook as one `balance` row for the whole charge, becomes this
 * checkout's: its balance part when there is one, else the first stylist's tip (the provider's payment stays on it).
 */
export async function claimCardPayment(
  db: Db,
  paymentId: string,
  checkoutId: string,
  as: { balanceCents: number } | { tipOf: string; cents: number },
): Promise<void> {
  const set =
    'balanceCents' in as
      ? { checkout_id: checkoutId, amount_cents: as.balanceCents }
      : { checkout_id: checkoutId, kind: 'tip' as const, staff_id: as.tipOf, amount_cents: as.cents };
  await db.updateTable('payments').set(set).where('id', '=', paymentId).execute();
}

/** The money taken at a checkout, with the tip's stylist, oldest first. */
export async function checkoutPayments(db: Db, checkoutId: string) {
  return db
    .selectFrom('payments as p')
    .leftJoin('staff as s', 's.id', 'p.staff_id')
    .select(['p.kind', 'p.method', 'p.amount_cents as amountCents', 's.display_name as stylistName', 'p.created_at as at', 'p.provider_ref as providerRef'])
    .where('p.checkout_id', '=', checkoutId)
    .where('p.status', '=', 'succeeded')
    .where('p.kind', 'in', ['balance', 'tip'])
    .orderBy('p.created_at')
    .orderBy('p.kind')
    .execute();
}

/** What of the checkout's balance was taken in cash so far (the card part pays the rest). */
export async function cashBalanceOf(db: Db, checkoutId: string): Promise<number> {
  const paid = await checkoutPayments(db, checkoutId);
  return paid.filter((p) => p.method === 'cash' && p.kind === 'balance').reduce((a, p) => a + p.amountCents, 0);
}
