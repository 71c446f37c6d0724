import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Db } from '@server/db/database';
import type { Payments } from '@server/payments/payments';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { DeskCheckout, DeskCheckoutBody } from '@shared/schemas/desk-checkout.schemas';
import { AppError, invalidField, notFound } from '@server/lib/app-error';
import { CheckoutError, computeCheckout, type Checkout } from '@shared/money/checkout';
import { formatMoney } from '@shared/money/money';
import { depositMoneyOf } from '../bookings';
import { sendOnTime, type Senders } from '../messages';
import { listRetailProducts, takeFromStock } from '../retail-products';
import { lockBookingForMoney } from './booking-money.repository';
import { findOpenCheckout } from './checkout-sessions.repository';
import { openCheckout } from './checkout.service';
import {
  checkoutPayments,
  findDeskCheckout,
  insertBalancePayment,
  insertDeskCheckout,
  insertTipPayments,
  visitFacts,
  type VisitFacts,
} from './checkouts.repository';
import { notReadyReason, serviceLinesOf } from './desk-checkout-input';
import { checkoutInputFor, type CheckoutOffer } from '@shared/money/checkout-input';
import type { RetailProduct } from '@shared/schemas/retail-product.schemas';
import { auditCheckout, completeDeskCheckout, tipWords } from './settle-balance.service';

/** The largest amount a checkout's integer columns hold (PostgreSQL's integer, 2^31 − 1). */
const MAX_STORED_CENTS = 2_147_483_647;
/** How long the hosted page for a checkout's card part stays open (the client pays at the desk, now). */
const CARD_PAGE_MINUTES = 60;

/** The deposit taken and not given back: what comes off the total. */
async function depositPaidOf(db: Db, bookingId: string): Promise<number> {
  const m = await depositMoneyOf(db, bookingId);
  return Math.max(0, m.paidCents - m.refundedCents);
}

/** A visit's checkout as the desk sees it: what it can charge, and the checkout once made, with its money. */
export async function deskCheckoutView(db: Kysely<Database>, user: SessionUser, bookingId: string): Promise<DeskCheckout> {
  // The checkout before the booking: read the other way round, a payment completing in between could show the
  // checkout paid beside a booking not yet checked out, and the desk's page would stop waiting on that.
  const stored = await findDeskCheckout(db, bookingId);
  const f = await visitFacts(db, user.salonId, bookingId);
  if (!f) throw notFound('That booking');
  const [depositPaidCents, products] = await Promise.all([depositPaidOf(db, bookingId), listRetailProducts(db, user.salonId)]);
  let checkout: DeskCheckout['checkout'] = null;
  if (stored) {
    const [paid, open] = await Promise.all([checkoutPayments(db, stored.id), findOpenCheckout(db, bookingId, 'balance')]);
    const cashCents = paid.filter((p) => p.method === 'cash').reduce((a, p) => a + p.amountCents, 0);
    checkout = {
      id: stored.id,
      status: stored.status,
      receipt: named(stored.receipt, f),
      cashCents,
      cardCents: stored.dueCents - cashCents,
      checkoutUrl: stored.status === 'open' ? (open?.url ?? null) : null,
      payments: paid.map((p) => ({
        kind: p.kind === 'tip' ? 'tip' : 'balance',
        method: p.method,
        amountCents: p.amountCents,
        stylistName: p.stylistName,
        at: p.at.toISOString(),
      })),
      createdAt: stored.createdAt.toISOString(),
      paidAt: stored.paidAt?.toISOString() ?? null,
    };
  }
  const why = notReadyReason(f.status, f.sittingStatuses);
  return {
    bookingId,
    bookingStatus: f.status,
    clientName: f.clientName,
    clientEmail: f.clientEmail,
    salonName: f.salonName,
    currency: f.currency,
    tax: { rateMilliPercent: f.taxRateMilliPercent, inclusive: f.taxInclusive },
    ready: why === null,
    notReadyReason: why,
    services: serviceLinesOf(f),
    stylists: f.stylists,
    depositPaidCents,
    products: products.filter((p) => p.active).map((p) => ({ id: p.id, name: p.name, priceCents: p.priceCents, stock: p.stock })),
    checkout,
  };
}

/** What the visit can charge, from the server's own records only. */
function offerOf(f: VisitFacts, products: RetailProduct[], depositPaidCents: number): CheckoutOffer {
  return {
    currency: f.currency,
    services: serviceLinesOf(f),
    products: products.filter((p) => p.active),
    tax: { rateMilliPercent: f.taxRateMilliPercent, inclusive: f.taxInclusive },
    depositPaidCents,
    stylistIds: f.stylists.map((s) => s.id),
  };
}

const named = (r: Checkout, f: VisitFacts) => ({
  ...r,
  tipShares: r.tipShares.map((s) => ({ ...s, name: f.stylists.find((x) => x.id === s.stylistId)?.name ?? 'Stylist' })),
});

/**
 * Checks a visit out, in one transaction: the receipt worked out by the server from its own records (any amount the
 * client sends is ignored), the checkout stored once per visit, the products taken from stock (409 naming one that
 * ran out), the cash part recorded, and the card part's hosted page opened. The payment service refusing or not
 * answering is a 503 and nothing is kept. Paid in full at once (cash, or nothing left to pay), the visit is
 * checked out and the receipt e-mailed; a card part completes it when its webhook comes.
 */
export async function checkOutVisit(
  db: Kysely<Database>,
  deps: { payments: Payments; senders: Senders },
  user: SessionUser,
  bookingId: string,
  body: DeskCheckoutBody,
  baseUrl: string,
  now: Date,
): Promise<DeskCheckout> {
  const messageIds = await db.transaction().execute(async (trx) => {
    const booking = await lockBookingForMoney(trx, bookingId);
    const f = booking && booking.salonId === user.salonId ? await visitFacts(trx, user.salonId, bookingId) : undefined;
    if (!f) throw notFound('That booking');
    if (await findDeskCheckout(trx, bookingId)) throw new AppError('CONFLICT', 409, 'This visit is checked out already.');
    const why = notReadyReason(f.status, f.sittingStatuses);
    if (why) throw new AppError('NOT_BOOKABLE', 409, why);

    const products = await listRetailProducts(trx, user.salonId);
    let receipt: Checkout;
    try {
      receipt = computeCheckout(checkoutInputFor(offerOf(f, products, await depositPaidOf(trx, bookingId)), body));
    } catch (err) {
      if (err instanceof CheckoutError) throw invalidField(err.field, err.message);
      throw err;
    }
    // The stored amounts are PostgreSQL integers: a checkout beyond them is refused, not a failed insert.
    if (receipt.subtotalCents + receipt.taxCents + receipt.tipCents > MAX_STORED_CENTS) throw invalidField('retail', 'Too large for one checkout');
    const cash = cashPartOf(body.pay, receipt);

    const checkoutId = await insertDeskCheckout(trx, { salonId: f.salonId, bookingId, receipt, createdBy: user.id });
    for (const [i, line] of body.retail.entries()) {
      if ((await takeFromStock(trx, f.salonId, line.productId, line.quantity)) === null) {
        // Read again: another checkout may have just taken what the list above still showed.
        const product = (await listRetailProducts(trx, f.salonId)).find((p) => p.id === line.productId);
        const message = `${product?.name ?? 'That product'}: only ${product?.stock ?? 0} left in stock.`;
        throw new AppError('CONFLICT', 409, message, { [`retail.${i}.quantity`]: message });
      }
    }
    const stored = {
      id: checkoutId,
      salonId: f.salonId,
      bookingId,
      currency: f.currency,
      receipt,
      status: 'open' as const,
      dueCents: receipt.toPayCents,
      createdAt: now,
      paidAt: null,
    };
    await auditCheckout(trx, stored, user.id, checkoutWords(receipt));
    const money = { salonId: f.salonId, bookingId, clientId: f.clientId, checkoutId, currency: f.currency, method: 'cash' as const, recordedBy: user.id };
    const cashBalance = Math.min(cash, receipt.dueCents);
    if (cashBalance > 0) {
      await insertBalancePayment(trx, money, cashBalance);
      await auditCheckout(trx, stored, user.id, `balance taken in cash: ${formatMoney(cashBalance, f.currency)}`);
    }
    const cardCents = receipt.toPayCents - cash;
    if (cardCents === 0) {
      await insertTipPayments(trx, money, receipt.tipShares);
      if (receipt.tipCents > 0) await auditCheckout(trx, stored, user.id, tipWords(stored, 'cash', f.stylists));
      return completeDeskCheckout(trx, stored, user.id, now);
    }
    // Inside the transaction: the payment service refusing or timing out leaves no checkout, stock or cash behind.
    const back = `${baseUrl}/desk/bookings/${bookingId}/checkout`;
    await openCheckout(
      trx,
      deps.payments,
      {
        salonId: f.salonId,
        bookingId,
        clientId: f.clientId,
        kind: 'balance',
        amountCents: cardCents,
        currency: f.currency,
        description: `${f.serviceName} at ${f.salonName}${receipt.tipCents > 0 ? ', with a tip' : ''}`,
        successUrl: `${back}?payment=done`,
        cancelUrl: `${back}?payment=cancelled`,
        expiresAt: new Date(now.getTime() + CARD_PAGE_MINUTES * 60_000),
      },
      now,
    );
    return [];
  });
  for (const id of messageIds) await sendOnTime(db, deps.senders, id, now).catch(() => undefined);
  return deskCheckoutView(db, user, bookingId);
}

/**
 * The cash taken now. Cash: everything. Card: nothing. Split: the cash part pays the balance, at most all of it, and
 * the card pays the rest and the tip, so a split always leaves something for the card.
 */
function cashPartOf(pay: DeskCheckoutBody['pay'], r: Checkout): number {
  if (pay.method === 'cash') return r.toPayCents;
  if (pay.method === 'card') return 0;
  if (pay.cashCents < 1) throw invalidField('pay.cashCents', 'Enter the cash part, or pay all by card');
  if (pay.cashCents > r.dueCents || pay.cashCents >= r.toPayCents) {
    throw invalidField(
      'pay.cashCents',
      `The cash part pays the balance and leaves something for the card: less than ${formatMoney(Math.min(r.dueCents + 1, r.toPayCents), r.currency)}`,
    );
  }
  return pay.cashCents;
}

function checkoutWords(r: Checkout): string {
  const m = (c: number) => formatMoney(c, r.currency);
  const parts = [`total ${m(r.totalCents)}`];
  if (r.discountCents > 0) parts.push(`discount ${m(r.discountCents)} (${r.discountReason ?? ''})`);
  if (r.depositPaidCents > 0) parts.push(`deposit applied ${m(r.depositPaidCents)}`);
  if (r.tipCents > 0) parts.push(`tip ${m(r.tipCents)}`);
  parts.push(`to pay ${m(r.toPayCents)}`);
  return `checkout: ${parts.join(', ')}`;
}
