import { CheckoutError, computeCheckout, type Checkout } from '@shared/money/checkout';
import { checkoutInputFor } from '@shared/money/checkout-input';
import type { DeskCheckout, DeskCheckoutBody } from '@shared/schemas/desk-checkout.schemas';

/** What the desk has chosen so far, amounts in minor units (null: not typed, or not an amount). */
export interface CheckoutDraft {
  /** Per service line: the "from" price set, and why. */
  services: { chargedCents: number | null; reason: string }[];
  retail: { productId: string; quantity: number }[];
  discount: { kind: 'amount'; cents: number | null; reason: string } | { kind: 'percent'; milliPercent: number | null; reason: string } | null;
  tipCents: number | null;
  pay: 'card' | 'cash' | 'split';
  cashCents: number | null;
}

export function emptyDraft(visit: DeskCheckout): CheckoutDraft {
  return {
    services: visit.services.map((s) => ({ chargedCents: s.upToCents === null ? null : s.priceCents, reason: '' })),
    retail: [],
    discount: null,
    tipCents: 0,
    pay: 'card',
    cashCents: null,
  };
}

/** The request the draft makes. The server works every amount out again; this only says what was chosen. */
export function draftBody(d: CheckoutDraft, visit: DeskCheckout, preview: Checkout | null): DeskCheckoutBody {
  return {
    services: visit.services.map((s, i) => {
      const chosen = d.services[i];
      return s.upToCents === null || !chosen ? {} : { chargedCents: chosen.chargedCents ?? s.priceCents, reason: chosen.reason };
    }),
    retail: d.retail,
    discount: !d.discount
      ? null
      : d.discount.kind === 'amount'
        ? { kind: 'amount', cents: d.discount.cents ?? 0, reason: d.discount.reason }
        : { kind: 'percent', milliPercent: d.discount.milliPercent ?? 0, reason: d.discount.reason },
    tipCents: d.tipCents ?? 0,
    pay: d.pay === 'split' ? { method: 'split', cashCents: d.cashCents ?? 0 } : { method: d.pay },
    ...(preview && { shownToPayCents: preview.toPayCents }),
  };
}

/** The receipt as the server will work it out (the same rules, the same function), or the field at fault and why. */
export function previewOf(d: CheckoutDraft, visit: DeskCheckout): { receipt: Checkout } | { field: string; message: string } {
  try {
    const offer = { ...visit, stylistIds: visit.stylists.map((s) => s.id) };
    return { receipt: computeCheckout(checkoutInputFor(offer, draftBody(d, visit, null))) };
  } catch (err) {
    if (err instanceof CheckoutError) return { field: err.field, message: err.message };
    throw err;
  }
}
