import type { DeskCheckoutBody } from '../schemas/desk-checkout.schemas';
import { CheckoutError, type CheckoutInput } from './checkout';

/** What a visit can charge, from the server's records: its service lines, the products on sale, tax, deposit, stylists. */
export interface CheckoutOffer {
  currency: string;
  /** A line with `upToCents` is a "from" price, set from `priceCents` up to it. */
  services: { label: string; priceCents: number; upToCents: number | null }[];
  products: { id: string; name: string; priceCents: number }[];
  tax: { rateMilliPercent: number; inclusive: boolean };
  depositPaidCents: number;
  /** The stylists who worked on the visit, who share a tip equally. */
  stylistIds: string[];
}

/**
 * computeCheckout's input from what the visit offers and what the desk chose. Every price comes from the offer
 * (the menu or quote, the product list), never from the request; a product not on sale is refused naming its line.
 * The server checks out with it, and the desk's screen shows the same receipt before it is sent.
 */
export function checkoutInputFor(offer: CheckoutOffer, body: Omit<DeskCheckoutBody, 'pay'>): CheckoutInput {
  if (body.services.length !== offer.services.length) throw new CheckoutError('services', `Send one entry per service line (${offer.services.length})`);
  return {
    currency: offer.currency,
    services: offer.services.map((line, i) => {
      if (line.upToCents === null) return { label: line.label, priceCents: line.priceCents };
      const chosen = body.services[i];
      return {
        label: line.label,
        priceCents: line.priceCents,
        fromPrice: { upToCents: line.upToCents, chargedCents: chosen?.chargedCents ?? line.priceCents, reason: chosen?.reason ?? '' },
      };
    }),
    retail: body.retail.map((r, i) => {
      const product = offer.products.find((p) => p.id === r.productId);
      if (!product) throw new CheckoutError(`retail.${i}.productId`, 'That product is not on sale');
      return { label: product.name, quantity: r.quantity, unitCents: product.priceCents };
    }),
    discount: body.discount,
    tax: offer.tax,
    depositPaidCents: offer.depositPaidCents,
    tip: body.tipCents > 0 ? { cents: body.tipCents, stylistIds: offer.stylistIds } : null,
  };
}
