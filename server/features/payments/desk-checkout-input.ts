import type { BookingStatus } from '@shared/schemas/common.schemas';
import type { DeskCheckout, DeskCheckoutBody } from '@shared/schemas/desk-checkout.schemas';
import type { RetailProduct } from '@shared/schemas/retail-product.schemas';
import { CheckoutError, type CheckoutInput } from '@shared/money/checkout';
import type { VisitFacts } from './checkouts.repository';

/**
 * When a visit can be checked out: once the client has arrived for every sitting (none is still to come), whether or
 * not the stylist has tapped the last step finished. The client pays on the way out, often before the last tap; a
 * correction in two sittings is paid once, at its last sitting.
 */
export function notReadyReason(status: BookingStatus, sittings: VisitFacts['sittingStatuses']): string | null {
  if (status === 'checked_out') return 'This visit is checked out already.';
  if (status === 'cancelled' || status === 'no_show' || status === 'held') return `A ${status.replace('_', '-')} booking has nothing to check out.`;
  if (status === 'booked' && sittings.every((s) => s === 'booked')) return 'The client has not arrived yet: mark the arrival first.';
  if (sittings.includes('booked')) return 'A sitting of this visit is still to come: check out at the last one.';
  return null;
}

/** The visit's service lines as the desk sees them: a "from" price with the range it may be set in. */
export function serviceLinesOf(f: VisitFacts): DeskCheckout['services'] {
  if (!f.priceIsFrom) return [{ label: f.serviceName, priceCents: f.bookedCents, upToCents: null }];
  // The range starts at the menu's "from" price and runs up to what the client was quoted (the booking's price).
  return [{ label: f.serviceName, priceCents: f.menuCents, upToCents: Math.max(f.menuCents, f.bookedCents) }];
}

/**
 * computeCheckout's input from the visit and the desk's choices: every price from the server's records (the menu or
 * quote, the product list), the tax from the salon's setting, the deposit from the money taken, the tip for the
 * stylists who worked on the visit. A product that is not on sale is refused naming its line.
 */
export function checkoutInputOf(f: VisitFacts, body: DeskCheckoutBody, products: RetailProduct[], depositPaidCents: number): CheckoutInput {
  const lines = serviceLinesOf(f);
  if (body.services.length !== lines.length) throw new CheckoutError('services', `Send one entry per service line (${lines.length})`);
  return {
    currency: f.currency,
    services: lines.map((line, i) => {
      const chosen = body.services[i];
      if (line.upToCents === null) return { label: line.label, priceCents: line.priceCents };
      const fromPrice = { upToCents: line.upToCents, chargedCents: chosen?.chargedCents ?? line.priceCents, reason: chosen?.reason ?? '' };
      return { label: line.label, priceCents: line.priceCents, fromPrice };
    }),
    retail: body.retail.map((r, i) => {
      const product = products.find((p) => p.id === r.productId && p.active);
      if (!product) throw new CheckoutError(`retail.${i}.productId`, 'That product is not on sale');
      return { label: product.name, quantity: r.quantity, unitCents: product.priceCents };
    }),
    discount: body.discount,
    tax: { rateMilliPercent: f.taxRateMilliPercent, inclusive: f.taxInclusive },
    depositPaidCents,
    tip: body.tipCents > 0 ? { cents: body.tipCents, stylistIds: f.stylists.map((s) => s.id) } : null,
  };
}
