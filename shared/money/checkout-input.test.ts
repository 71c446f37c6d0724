import { describe, expect, it } from 'vitest';
import { computeCheckout } from './checkout';
import { checkoutInputFor, type CheckoutOffer } from './checkout-input';

const offer: CheckoutOffer = {
  currency: 'USD',
  services: [{ label: 'Gloss', priceCents: 4500, upToCents: 6500 }],
  products: [{ id: 'p1', name: 'Mask', priceCents: 3150 }],
  tax: { rateMilliPercent: 0, inclusive: false },
  depositPaidCents: 0,
  stylistIds: ['a', 'b'],
};

describe('a checkout from what the visit offers and what the desk chose', () => {
  it('takes every price from the offer, the "from" price within its range, the tip for the stylists who worked', () => {
    const input = checkoutInputFor(offer, {
      services: [{ chargedCents: 5500, reason: 'Long hair' }],
      retail: [{ productId: 'p1', quantity: 2 }],
      discount: null,
      tipCents: 1001,
    });
    const r = computeCheckout(input);
    // 55.00 + 2 × 31.50 = 118.00; the tip's odd cent to the first stylist (docs/money.md, rule 6).
    expect(r.totalCents).toBe(11800);
    expect(r.tipShares).toEqual([
      { stylistId: 'a', cents: 501 },
      { stylistId: 'b', cents: 500 },
    ]);
  });
  it('refuses a product not on the list and a wrong count of service lines, naming the field', () => {
    const body = { services: [{}], retail: [{ productId: 'gone', quantity: 1 }], discount: null, tipCents: 0 };
    expect(() => checkoutInputFor(offer, body)).toThrow(expect.objectContaining({ field: 'retail.0.productId' }));
    expect(() => checkoutInputFor(offer, { ...body, services: [], retail: [] })).toThrow(expect.objectContaining({ field: 'services' }));
  });
});
