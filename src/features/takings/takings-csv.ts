import type { Takings } from '@shared/schemas/takings.schemas';
import { instantIso } from '@shared/time/salon-time';
import { minorToUnits } from '@shared/money/money';
import { toCsv, type CsvCell } from '@client/lib/csv';

/**
 * The day's takings as one CSV: every movement (money in positive, refunds negative, in the currency's units), then
 * the totals and the close, each a row of its own under the same columns. Times are ISO 8601 in salon time.
 */
export function takingsCsv(t: Takings): string {
  const units = (cents: number) => minorToUnits(cents, t.currency);
  const rows: CsvCell[][] = t.movements.map((m) => [instantIso(m.at, t.timeZone), m.kind, m.method, units(m.amountCents), m.clientName, m.stylistName, m.note]);
  const total = (label: string, cents: number, method: string | null = null, who: string | null = null): CsvCell[] => [
    t.date,
    label,
    method,
    units(cents),
    null,
    who,
    null,
  ];
  rows.push(
    total('total in', t.byMethod.card.inCents, 'card'),
    total('total refunded', t.byMethod.card.refundedCents, 'card'),
    total('total in', t.byMethod.cash.inCents, 'cash'),
    total('total refunded', t.byMethod.cash.refundedCents, 'cash'),
    total('deposits taken', t.deposits.takenCents),
    total('deposits applied at checkout', t.deposits.appliedCents),
    total('deposits refunded', t.deposits.refundedCents),
    total('balances', t.balancesCents),
    total('refunds', t.refundsCents),
    ...t.tipsByStylist.map((s) => total('tips', s.tipsCents, null, s.name)),
    total('cash expected', t.expectedCashCents, 'cash'),
  );
  if (t.close) rows.push(total('cash counted', t.close.countedCashCents, 'cash'), total('cash difference', t.close.differenceCents, 'cash'));
  return toCsv(['When', 'What', 'Method', `Amount (${t.currency})`, 'Client', 'Stylist', 'Note'], rows);
}
