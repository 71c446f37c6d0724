import { formatMoney } from './money';
import { PERCENT_SCALE } from './percent';
import { percentOf, shareOut, taxInside } from './rounding';

/*
 * Checkout arithmetic: what a visit comes to, in whole minor units of the salon's currency (cents, yen, fils;
 * the currency's ISO 4217 exponent says how many there are to the unit). The rules, also in docs/money.md:
 *
 * 1. Each line is its price: a service at the menu's price or the quote's; a "from" price at the amount set
 *    within the range quoted to the client, with a reason; a product at quantity × unit price.
 * 2. One discount for the receipt, an amount or a percentage of the lines, with a reason. A percentage rounds
 *    half up to the minor unit. It is spread over the lines in proportion to their amounts (largest remainder:
 *    the left-over minor units go to the lines with the largest remainders, an earlier line first on a tie), so
 *    the lines after the discount add up exactly. It may not exceed the lines: nothing goes below zero.
 * 3. Tax once per receipt, not per line, at the salon's rate on the lines after the discount, rounded half up to
 *    the minor unit. Exclusive: added on top (total = lines + tax). Inclusive: the prices hold it already, and
 *    the tax is the part rate / (100 % + rate) of them (total = lines).
 * 4. The deposit already paid comes off the total; a total below the deposit is refused, never a negative due.
 * 5. The tip is added after tax (it is not taxed) and split equally between the stylists who worked on the
 *    visit, in the order given, the left-over minor units one each to the first stylists.
 */

export interface ServiceLine {
  label: string;
  /** The menu's price, or the quote's when the visit was booked from one; for a "from" price, where its range starts. */
  priceCents: number;
  /** A "from" price: the amount set at checkout, within the range quoted (`priceCents` to `upToCents`), and why. */
  fromPrice?: { upToCents: number; chargedCents: number; reason: string };
}

export interface RetailLine {
  label: string;
  quantity: number;
  unitCents: number;
}

export type Discount = { kind: 'amount'; cents: number; reason: string } | { kind: 'percent'; milliPercent: number; reason: string };

export interface CheckoutInput {
  /** ISO 4217 code; amounts are in its minor unit. */
  currency: string;
  services: ServiceLine[];
  retail: RetailLine[];
  discount: Discount | null;
  /** The salon's setting: the rate in thousandths of a percent (8.25 % is 8250), and whether prices include it. */
  tax: { rateMilliPercent: number; inclusive: boolean };
  depositPaidCents: number;
  /** The tip and the stylists who worked on the visit, in the order the remainder is given. */
  tip: { cents: number; stylistIds: string[] } | null;
}

export interface ReceiptLine {
  kind: 'service' | 'retail';
  label: string;
  quantity: number;
  unitCents: number;
  /** quantity × unit price, before the discount. */
  amountCents: number;
  /** This line's part of the discount. */
  discountCents: number;
  /** amount − discount. */
  chargedCents: number;
  /** Why a "from" price was set where it was. */
  reason: string | null;
}

export interface Checkout {
  currency: string;
  lines: ReceiptLine[];
  /** The lines before the discount. */
  subtotalCents: number;
  discountCents: number;
  discountReason: string | null;
  taxRateMilliPercent: number;
  taxInclusive: boolean;
  taxCents: number;
  /** The total without its tax. */
  netCents: number;
  /** What the visit comes to, tax included. */
  totalCents: number;
  depositPaidCents: number;
  /** total − deposit. */
  dueCents: number;
  tipCents: number;
  tipShares: { stylistId: string; cents: number }[];
  /** What the client pays now: due + tip. */
  toPayCents: number;
}

/** A checkout that cannot be: `field` names the input at fault (`services.0.fromPrice.reason`), as a 400 would. */
export class CheckoutError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
  }
}

function refuse(field: string, message: string): never {
  throw new CheckoutError(field, message);
}

function wholeAmount(value: number, field: string, least = 0): number {
  if (!Number.isSafeInteger(value) || value < least)
    refuse(field, least > 0 ? `Must be a whole number of at least ${least}` : 'Must be a whole amount, not below zero');
  return value;
}

function serviceLine(line: ServiceLine, i: number, currency: string): ReceiptLine {
  const at = `services.${i}`;
  const start = wholeAmount(line.priceCents, `${at}.priceCents`);
  let charged = start;
  let reason: string | null = null;
  if (line.fromPrice) {
    const upTo = wholeAmount(line.fromPrice.upToCents, `${at}.fromPrice.upToCents`);
    if (upTo < start) refuse(`${at}.fromPrice.upToCents`, `The range cannot end below its start, ${formatMoney(start, currency)}`);
    charged = wholeAmount(line.fromPrice.chargedCents, `${at}.fromPrice.chargedCents`);
    if (charged < start || charged > upTo)
      refuse(`${at}.fromPrice.chargedCents`, `Set it within the quoted range, ${formatMoney(start, currency)} to ${formatMoney(upTo, currency)}`);
    reason = line.fromPrice.reason.trim() || null;
    if (charged !== start && !reason) refuse(`${at}.fromPrice.reason`, 'Say why the price is above where its range starts');
  }
  return { kind: 'service', label: line.label, quantity: 1, unitCents: charged, amountCents: charged, discountCents: 0, chargedCents: charged, reason };
}

function retailLine(line: RetailLine, i: number): ReceiptLine {
  const quantity = wholeAmount(line.quantity, `retail.${i}.quantity`, 1);
  const unit = wholeAmount(line.unitCents, `retail.${i}.unitCents`);
  const amount = wholeAmount(quantity * unit, `retail.${i}.quantity`);
  return { kind: 'retail', label: line.label, quantity, unitCents: unit, amountCents: amount, discountCents: 0, chargedCents: amount, reason: null };
}

/** The discount in minor units, refused when it would take the lines below zero. */
function discountOf(discount: Discount | null, subtotal: number, currency: string): { cents: number; reason: string | null } {
  if (!discount) return { cents: 0, reason: null };
  const reason = discount.reason.trim();
  if (!reason) refuse('discount.reason', 'Say why the discount is given');
  if (discount.kind === 'percent') {
    const rate = wholeAmount(discount.milliPercent, 'discount.milliPercent', 1);
    if (rate > PERCENT_SCALE) refuse('discount.milliPercent', 'At most 100 %');
    return { cents: percentOf(subtotal, rate), reason };
  }
  const cents = wholeAmount(discount.cents, 'discount.cents', 1);
  if (cents > subtotal) refuse('discount.cents', `The discount cannot be more than the lines, ${formatMoney(subtotal, currency)}`);
  return { cents, reason };
}

function tipSharesOf(tip: CheckoutInput['tip']): Checkout['tipShares'] {
  if (!tip) return [];
  const cents = wholeAmount(tip.cents, 'tip.cents');
  if (cents > 0 && tip.stylistIds.length === 0) refuse('tip.stylistIds', 'Name the stylists who share the tip');
  if (new Set(tip.stylistIds).size !== tip.stylistIds.length) refuse('tip.stylistIds', 'Each stylist once');
  const shares = shareOut(
    cents,
    tip.stylistIds.map(() => 1),
  );
  return tip.stylistIds.map((stylistId, i) => ({ stylistId, cents: shares[i] ?? 0 }));
}

/** What a visit comes to under the rules above; a CheckoutError names the input that makes it impossible. */
export function computeCheckout(input: CheckoutInput): Checkout {
  const { currency } = input;
  const lines = [...input.services.map((l, i) => serviceLine(l, i, currency)), ...input.retail.map(retailLine)];
  if (lines.length === 0) refuse('services', 'A checkout needs at least one service or product');
  const rate = wholeAmount(input.tax.rateMilliPercent, 'tax.rateMilliPercent');
  if (rate > PERCENT_SCALE) refuse('tax.rateMilliPercent', 'At most 100 %');

  const subtotal = lines.reduce((a, l) => a + l.amountCents, 0);
  const discount = discountOf(input.discount, subtotal, currency);
  const parts = shareOut(
    discount.cents,
    lines.map((l) => l.amountCents),
  );
  const discounted = lines.map((l, i) => ({ ...l, discountCents: parts[i] ?? 0, chargedCents: l.amountCents - (parts[i] ?? 0) }));
  const afterDiscount = subtotal - discount.cents;

  const tax = input.tax.inclusive ? taxInside(afterDiscount, rate) : percentOf(afterDiscount, rate);
  const total = input.tax.inclusive ? afterDiscount : afterDiscount + tax;
  const deposit = wholeAmount(input.depositPaidCents, 'depositPaidCents');
  if (deposit > total)
    refuse(
      'depositPaidCents',
      `The deposit paid, ${formatMoney(deposit, currency)}, is more than the total, ${formatMoney(total, currency)}: the balance would be below zero`,
    );

  const tipShares = tipSharesOf(input.tip);
  const tip = tipShares.reduce((a, s) => a + s.cents, 0);
  return {
    currency,
    lines: discounted,
    subtotalCents: subtotal,
    discountCents: discount.cents,
    discountReason: discount.reason,
    taxRateMilliPercent: rate,
    taxInclusive: input.tax.inclusive,
    taxCents: tax,
    netCents: total - tax,
    totalCents: total,
    depositPaidCents: deposit,
    dueCents: total - deposit,
    tipCents: tip,
    tipShares,
    toPayCents: total - deposit + tip,
  };
}
