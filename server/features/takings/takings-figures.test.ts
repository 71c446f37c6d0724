import { describe, expect, it } from 'vitest';
import { takingsFigures } from './takings-figures';
import type { DayMovement } from './takings.repository';

const at = new Date('2026-12-03T17:00:00Z');
const move = (m: Partial<DayMovement> & Pick<DayMovement, 'kind' | 'amountCents'>): DayMovement => ({
  at,
  method: 'card',
  ofKind: null,
  staffId: null,
  stylistName: null,
  clientName: 'A client',
  note: '',
  ...m,
});

describe('takings figures: tips per stylist', () => {
  // A worked example in whole cents (ISO 4217 USD has 2 decimals): Ana takes $10.00 and $2.50 in tips, Lee $5.00;
  // $3.00 of Ana's first tip is handed back. Ana is owed $9.50, Lee $5.00; the tips that came in stay $17.50 and the
  // refund counts among the day's refunds.
  it('takes a refunded tip off its stylist, not off the tips that came in', () => {
    const f = takingsFigures(
      [
        move({ kind: 'tip', amountCents: 1000, staffId: 'ana', stylistName: 'Ana' }),
        move({ kind: 'tip', amountCents: 250, method: 'cash', staffId: 'ana', stylistName: 'Ana' }),
        move({ kind: 'tip', amountCents: 500, staffId: 'lee', stylistName: 'Lee' }),
        move({ kind: 'refund', amountCents: 300, ofKind: 'tip', staffId: 'ana', stylistName: 'Ana' }),
      ],
      0,
    );
    expect(f.tipsByStylist).toEqual([
      { stylistId: 'ana', name: 'Ana', tipsCents: 950 },
      { stylistId: 'lee', name: 'Lee', tipsCents: 500 },
    ]);
    expect(f.tipsCents).toBe(1750);
    expect(f.refundsCents).toBe(300);
    expect(f.byMethod.card).toEqual({ inCents: 1500, refundedCents: 300, netCents: 1200 });
    expect(f.expectedCashCents).toBe(250);
  });
});
