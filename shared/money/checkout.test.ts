import { describe, expect, it } from 'vitest';
import { computeCheckout, CheckoutError, type CheckoutInput } from './checkout';
import { currencyExponent } from './currency-exponent';

/*
 * Worked examples computed by hand (the working is in the comments); amounts are in minor units. Rounding:
 * a rate rounds half up to the minor unit, a discount is spread by largest remainder, tax once per receipt.
 */

const base: CheckoutInput = {
  currency: 'USD',
  services: [],
  retail: [],
  discount: null,
  tax: { rateMilliPercent: 0, inclusive: false },
  depositPaidCents: 0,
  tip: null,
};

function refusal(input: CheckoutInput): { field: string; message: string } {
  try {
    computeCheckout(input);
  } catch (e) {
    if (e instanceof CheckoutError) return { field: e.field, message: e.message };
    throw e;
  }
  throw new Error('expected the checkout to be refused');
}

describe('computeCheckout: worked examples', () => {
  it('USD, tax exclusive, a "from" price, an amount discount spread over the lines, a tip for three', () => {
    // ISO 4217: USD has 2 decimals, so amounts are cents.
    expect(currencyExponent('USD')).toBe(2);
    const checkout = computeCheckout({
      ...base,
      services: [
        { label: 'Colour correction, sitting 2', priceCents: 26000 },
        // A "from" price: the gloss starts at $45.00, $65.00 was the top of the range quoted; set at $55.00.
        { label: 'Gloss', priceCents: 4500, fromPrice: { upToCents: 6500, chargedCents: 5500, reason: 'Long, thick hair: a second bowl' } },
      ],
      retail: [
        { label: 'Bond shampoo', quantity: 2, unitCents: 2400 }, // 2 × 24.00 = 48.00
        { label: 'Colour mask', quantity: 1, unitCents: 3150 },
      ],
      discount: { kind: 'amount', cents: 2000, reason: 'Waited 40 minutes' },
      tax: { rateMilliPercent: 8250, inclusive: false },
      depositPaidCents: 5000,
      tip: { cents: 1000, stylistIds: ['ana', 'lee', 'marcus'] },
    });
    // Subtotal 26000 + 5500 + 4800 + 3150 = 39450.
    expect(checkout.subtotalCents).toBe(39450);
    // Discount 2000 spread by amount, 2000 × amount / 39450:
    //   26000 → 1318.12 (1318, remainder 4900/39450)     5500 → 278.83 (278, remainder 32900)
    //    4800 →  243.35 (243, remainder 13650)            3150 → 159.70 (159, remainder 27450)
    //   whole parts 1998, so the 2 left go to the largest remainders: the gloss (32900) and the mask (27450).
    expect(checkout.lines.map((l) => l.discountCents)).toEqual([1318, 279, 243, 160]);
    expect(checkout.lines.map((l) => l.chargedCents)).toEqual([24682, 5221, 4557, 2990]);
    expect(checkout.lines[1]!.reason).toBe('Long, thick hair: a second bowl');
    // Tax exclusive, once on the receipt: 8.25 % of 37450 = 3089.625 → 3090.
    expect(checkout.taxCents).toBe(3090);
    expect(checkout.netCents).toBe(37450);
    expect(checkout.totalCents).toBe(40540);
    // Less the deposit: 40540 − 5000 = 35540. Tip 1000 / 3 = 333 r 1: the first stylist gets the extra cent.
    expect(checkout.dueCents).toBe(35540);
    expect(checkout.tipShares).toEqual([
      { stylistId: 'ana', cents: 334 },
      { stylistId: 'lee', cents: 333 },
      { stylistId: 'marcus', cents: 333 },
    ]);
    expect(checkout.toPayCents).toBe(36540);
  });

  it('GBP, tax inclusive, a percentage discount whose half penny goes up', () => {
    // ISO 4217: GBP has 2 decimals (pence).
    expect(currencyExponent('GBP')).toBe(2);
    const checkout = computeCheckout({
      ...base,
      currency: 'GBP',
      services: [{ label: 'Full head colour', priceCents: 12000 }],
      retail: [{ label: 'Purple shampoo', quantity: 1, unitCents: 1850 }],
      discount: { kind: 'percent', milliPercent: 15_000, reason: 'Family of staff' },
      tax: { rateMilliPercent: 20_000, inclusive: true },
      depositPaidCents: 2000,
      tip: { cents: 500, stylistIds: ['ana'] },
    });
    // 15 % of 13850 = 2077.5 → 2078 (half up; half-even would give 2078 too, 2077 being odd).
    expect(checkout.discountCents).toBe(2078);
    // Spread: 2078 × 12000 / 13850 = 1800.43 (1800, remainder 6000), 2078 × 1850 / 13850 = 277.57 (277, remainder 7850);
    // one penny left, to the shampoo's larger remainder.
    expect(checkout.lines.map((l) => l.discountCents)).toEqual([1800, 278]);
    // Prices include the tax: 20 % inside 11772 is 11772 × 20 / 120 = 1962 exactly; the total stays 11772.
    expect(checkout.taxCents).toBe(1962);
    expect(checkout.netCents).toBe(9810);
    expect(checkout.totalCents).toBe(11772);
    expect(checkout.dueCents).toBe(9772);
    expect(checkout.tipShares).toEqual([{ stylistId: 'ana', cents: 500 }]);
    expect(checkout.toPayCents).toBe(10272);
  });

  it('GBP, tax inclusive, without a discount: the tax inside rounds to the penny', () => {
    const checkout = computeCheckout({
      ...base,
      currency: 'GBP',
      services: [{ label: 'Full head colour', priceCents: 12000 }],
      retail: [{ label: 'Purple shampoo', quantity: 1, unitCents: 1850 }],
      tax: { rateMilliPercent: 20_000, inclusive: true },
    });
    // 13850 × 20 / 120 = 2308.33 → 2308; net 13850 − 2308 = 11542.
    expect([checkout.taxCents, checkout.netCents, checkout.totalCents]).toEqual([2308, 11542, 13850]);
  });

  it('JPY (no minor unit), tax exclusive: every rounding is to the whole yen', () => {
    // ISO 4217: JPY has 0 decimals, so the minor unit is the yen itself.
    expect(currencyExponent('JPY')).toBe(0);
    const checkout = computeCheckout({
      ...base,
      currency: 'JPY',
      services: [{ label: 'Balayage', priceCents: 16500 }],
      retail: [{ label: 'Hair oil', quantity: 1, unitCents: 2980 }],
      discount: { kind: 'percent', milliPercent: 7000, reason: 'Opening week' },
      tax: { rateMilliPercent: 10_000, inclusive: false },
      depositPaidCents: 3000,
      tip: { cents: 1001, stylistIds: ['ana', 'lee'] },
    });
    // 7 % of 19480 = 1363.6 → 1364 yen.
    expect(checkout.discountCents).toBe(1364);
    // Spread: 1364 × 16500 / 19480 = 1155.34 (1155, remainder 6600), 1364 × 2980 / 19480 = 208.66 (208, remainder 12880);
    // the one yen left goes to the oil.
    expect(checkout.lines.map((l) => l.discountCents)).toEqual([1155, 209]);
    // 19480 − 1364 = 18116; 10 % of it = 1811.6 → 1812; total 19928; less the deposit 16928.
    expect(checkout.taxCents).toBe(1812);
    expect(checkout.totalCents).toBe(19928);
    expect(checkout.dueCents).toBe(16928);
    // 1001 yen between two: 500 r 1, the first stylist gets 501.
    expect(checkout.tipShares.map((s) => s.cents)).toEqual([501, 500]);
    expect(checkout.toPayCents).toBe(17929);
  });

  it('KWD (three decimals), tax inclusive, a "from" price, a percentage discount over three lines', () => {
    // ISO 4217: KWD has 3 decimals, 1000 fils to the dinar.
    expect(currencyExponent('KWD')).toBe(3);
    const checkout = computeCheckout({
      ...base,
      currency: 'KWD',
      services: [
        { label: 'Colour correction', priceCents: 45_000 }, // KWD 45.000
        // From KWD 12.500, quoted up to 18.000, set at 15.750.
        { label: 'Gloss', priceCents: 12_500, fromPrice: { upToCents: 18_000, chargedCents: 15_750, reason: 'Shoulder length' } },
      ],
      retail: [{ label: 'Bond mask', quantity: 3, unitCents: 4125 }], // 3 × 4.125 = 12.375
      discount: { kind: 'percent', milliPercent: 12_500, reason: 'Loyalty card' },
      tax: { rateMilliPercent: 5000, inclusive: true },
      depositPaidCents: 10_000,
      tip: { cents: 2000, stylistIds: ['ana', 'lee', 'marcus'] },
    });
    // Subtotal 45000 + 15750 + 12375 = 73125 fils; 12.5 % of it = 9140.625 → 9141.
    expect(checkout.subtotalCents).toBe(73_125);
    expect(checkout.discountCents).toBe(9141);
    // Spread 9141 × amount / 73125: 45000 → 5625.23 (5625, remainder 16875), 15750 → 1968.83 (1968, remainder 60750),
    // 12375 → 1546.94 (1546, remainder 68625); two fils left, to the mask (68625) and the gloss (60750).
    expect(checkout.lines.map((l) => l.discountCents)).toEqual([5625, 1969, 1547]);
    expect(checkout.lines.map((l) => l.chargedCents)).toEqual([39_375, 13_781, 10_828]);
    // 73125 − 9141 = 63984, tax included: 5 % inside it is 63984 × 5 / 105 = 3046.86 → 3047; net 60937.
    expect([checkout.taxCents, checkout.netCents, checkout.totalCents]).toEqual([3047, 60_937, 63_984]);
    expect(checkout.dueCents).toBe(53_984);
    // 2000 fils between three: 666 r 2, so the first two get 667.
    expect(checkout.tipShares.map((s) => s.cents)).toEqual([667, 667, 666]);
    expect(checkout.toPayCents).toBe(55_984);
  });

  it('a half minor unit of tax goes up', () => {
    // 5 % of 4450 = 222.5 → 223 (half-even would give 222).
    const checkout = computeCheckout({ ...base, services: [{ label: 'Toner', priceCents: 4450 }], tax: { rateMilliPercent: 5000, inclusive: false } });
    expect(checkout.taxCents).toBe(223);
    expect(checkout.totalCents).toBe(4673);
  });

  it('a discount of every line leaves a total of zero, and a "from" price at its start needs no reason', () => {
    const checkout = computeCheckout({
      ...base,
      services: [{ label: 'Gloss', priceCents: 4500, fromPrice: { upToCents: 6500, chargedCents: 4500, reason: '' } }],
      discount: { kind: 'percent', milliPercent: 100_000, reason: 'Redo of last week’s toner' },
      tax: { rateMilliPercent: 8250, inclusive: false },
    });
    expect([checkout.discountCents, checkout.taxCents, checkout.totalCents, checkout.toPayCents]).toEqual([4500, 0, 0, 0]);
    expect(checkout.lines[0]!.reason).toBeNull();
  });
});

describe('computeCheckout: refusals name the field', () => {
  const gloss = { label: 'Gloss', priceCents: 4500 };
  it.each([
    [
      'a "from" price below its range',
      { services: [{ ...gloss, fromPrice: { upToCents: 6500, chargedCents: 4000, reason: 'x' } }] },
      'services.0.fromPrice.chargedCents',
    ],
    [
      'a "from" price above its range',
      { services: [{ ...gloss, fromPrice: { upToCents: 6500, chargedCents: 6501, reason: 'x' } }] },
      'services.0.fromPrice.chargedCents',
    ],
    [
      'a "from" price raised without a reason',
      { services: [{ ...gloss, fromPrice: { upToCents: 6500, chargedCents: 5000, reason: '  ' } }] },
      'services.0.fromPrice.reason',
    ],
    [
      'a range that ends below its start',
      { services: [{ ...gloss, fromPrice: { upToCents: 4000, chargedCents: 4500, reason: 'x' } }] },
      'services.0.fromPrice.upToCents',
    ],
    ['a discount larger than the lines', { services: [gloss], discount: { kind: 'amount', cents: 4501, reason: 'x' } }, 'discount.cents'],
    ['a percentage over 100', { services: [gloss], discount: { kind: 'percent', milliPercent: 100_001, reason: 'x' } }, 'discount.milliPercent'],
    ['a discount without a reason', { services: [gloss], discount: { kind: 'amount', cents: 100, reason: '' } }, 'discount.reason'],
    ['a negative price', { services: [{ ...gloss, priceCents: -1 }] }, 'services.0.priceCents'],
    ['a fraction of a minor unit', { retail: [{ label: 'Oil', quantity: 1, unitCents: 10.5 }] }, 'retail.0.unitCents'],
    ['no quantity', { retail: [{ label: 'Oil', quantity: 0, unitCents: 1000 }] }, 'retail.0.quantity'],
    ['nothing to check out', {}, 'services'],
    ['a tip nobody shares', { services: [gloss], tip: { cents: 500, stylistIds: [] } }, 'tip.stylistIds'],
    ['a stylist named twice', { services: [gloss], tip: { cents: 500, stylistIds: ['ana', 'ana'] } }, 'tip.stylistIds'],
    ['a negative tip', { services: [gloss], tip: { cents: -100, stylistIds: ['ana'] } }, 'tip.cents'],
  ] as const)('refuses %s', (_what, change, field) => {
    expect(refusal({ ...base, ...(change as Partial<CheckoutInput>) }).field).toBe(field);
  });

  it('refuses a total below the deposit paid rather than a balance below zero', () => {
    // 4500 less a 1000 discount is 3500, plus 8.25 % tax (288.75 → 289) is 3789: under the 5000 deposit.
    const refused = refusal({
      ...base,
      services: [gloss],
      discount: { kind: 'amount', cents: 1000, reason: 'Short on time' },
      tax: { rateMilliPercent: 8250, inclusive: false },
      depositPaidCents: 5000,
    });
    expect(refused).toEqual({
      field: 'depositPaidCents',
      message: 'The deposit paid, $50.00, is more than the total, $37.89: the balance would be below zero',
    });
  });
});
