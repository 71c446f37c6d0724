/**
 * A salon day's takings from its money movements (docs/money.md, "Takings"). Pure: the service reads the rows.
 * Money in counts by its method; a refund goes back by the method of the payment it returns (cash as cash).
 */
import type { Takings } from '@shared/schemas/takings.schemas';
import type { DayMovement } from './takings.repository';

export type TakingsFigures = Omit<Takings, 'date' | 'timeZone' | 'currency' | 'close' | 'reopened' | 'movements'>;

export function takingsFigures(movements: DayMovement[], depositsAppliedCents: number): TakingsFigures {
  const byMethod = { card: { inCents: 0, refundedCents: 0, netCents: 0 }, cash: { inCents: 0, refundedCents: 0, netCents: 0 } };
  const deposits = { takenCents: 0, appliedCents: depositsAppliedCents, refundedCents: 0 };
  const tips = new Map<string, { stylistId: string | null; name: string; tipsCents: number }>();
  const tallyOf = (m: DayMovement) => {
    const key = m.staffId ?? '';
    const tally = tips.get(key) ?? { stylistId: m.staffId, name: m.stylistName ?? 'A stylist no longer on the staff', tipsCents: 0 };
    tips.set(key, tally);
    return tally;
  };
  let balancesCents = 0;
  let refundsCents = 0;
  let tipsCents = 0;
  for (const m of movements) {
    const method = byMethod[m.method];
    if (m.kind === 'refund') {
      method.refundedCents += m.amountCents;
      refundsCents += m.amountCents;
      if (m.ofKind === 'deposit') deposits.refundedCents += m.amountCents;
      // A tip handed back is no longer the stylist's: tips per stylist are what each is owed.
      if (m.ofKind === 'tip') tallyOf(m).tipsCents -= m.amountCents;
      continue;
    }
    method.inCents += m.amountCents;
    if (m.kind === 'deposit') deposits.takenCents += m.amountCents;
    if (m.kind === 'balance') balancesCents += m.amountCents;
    if (m.kind === 'tip') {
      tipsCents += m.amountCents;
      tallyOf(m).tipsCents += m.amountCents;
    }
  }
  for (const t of Object.values(byMethod)) t.netCents = t.inCents - t.refundedCents;
  return {
    byMethod,
    deposits,
    balancesCents,
    refundsCents,
    tipsCents,
    tipsByStylist: [...tips.values()].sort((a, b) => a.name.localeCompare(b.name)),
    // The drawer's float is the salon's own money, not the day's: it is not part of what is expected or counted.
    expectedCashCents: byMethod.cash.netCents,
  };
}
