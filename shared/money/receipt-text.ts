import type { Checkout } from './checkout';
import { formatMoney } from './money';
import { percentText } from './percent';

/** A receipt's tax line in words: inside the prices (inclusive) or added on top (exclusive). */
export function taxWording(r: Pick<Checkout, 'taxInclusive' | 'taxRateMilliPercent'>): string {
  const rate = `${percentText(r.taxRateMilliPercent)} %`;
  return r.taxInclusive ? `Tax included in the prices (${rate})` : `Tax (${rate})`;
}

/** What a receipt says, as label and amount rows: the e-mailed receipt writes them out; the printed one lays them out. */
export function receiptRows(r: Checkout, stylistName: (id: string) => string): { label: string; amount: string }[] {
  const money = (cents: number) => formatMoney(cents, r.currency);
  const rows = r.lines.map((l) => ({
    label: `${l.quantity > 1 ? `${l.quantity} × ` : ''}${l.label}${l.reason ? ` (${l.reason})` : ''}`,
    amount: money(l.amountCents),
  }));
  rows.push({ label: 'Subtotal', amount: money(r.subtotalCents) });
  if (r.discountCents > 0) rows.push({ label: `Discount (${r.discountReason ?? ''})`, amount: `−${money(r.discountCents)}` });
  if (r.taxRateMilliPercent > 0) rows.push({ label: taxWording(r), amount: money(r.taxCents) });
  rows.push({ label: 'Total', amount: money(r.totalCents) });
  if (r.depositPaidCents > 0) rows.push({ label: 'Deposit paid before', amount: `−${money(r.depositPaidCents)}` });
  for (const s of r.tipShares) if (s.cents > 0) rows.push({ label: `Tip for ${stylistName(s.stylistId)}`, amount: money(s.cents) });
  rows.push({ label: 'Paid today', amount: money(r.toPayCents) });
  return rows;
}
