import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parsePercent, percentText } from './percent';
import { divideHalfUp, percentOf, shareOut, taxInside } from './rounding';

describe('divideHalfUp and percentOf', () => {
  it('rounds to the nearest minor unit, a half going up', () => {
    expect([divideHalfUp(5n, 2n), divideHalfUp(7n, 2n), divideHalfUp(4n, 3n), divideHalfUp(5n, 3n)]).toEqual([3, 4, 1, 2]);
    expect(percentOf(4450, 5000)).toBe(223); // 222.5 → 223
    expect(percentOf(37450, 8250)).toBe(3090); // 3089.625 → 3090
    expect(taxInside(13850, 20_000)).toBe(2308); // 13850 / 6 = 2308.33 → 2308
  });

  it('keeps every digit of large amounts', () => {
    // 7.125 % of 9 007 199 254 740 991 (2^53 − 1) = 641 762 946 900 295.6 → …296; the product itself is beyond 2^53.
    expect(percentOf(Number.MAX_SAFE_INTEGER, 7125)).toBe(641_762_946_900_296);
  });
});

describe('shareOut', () => {
  it('gives the left-over units to the largest remainders, an earlier part first on a tie', () => {
    expect(shareOut(1000, [1, 1, 1])).toEqual([334, 333, 333]);
    expect(shareOut(2000, [1, 1, 1])).toEqual([667, 667, 666]);
    expect(shareOut(2000, [26000, 5500, 4800, 3150])).toEqual([1318, 279, 243, 160]);
    expect(shareOut(0, [5, 5])).toEqual([0, 0]);
    expect(shareOut(0, [0, 0])).toEqual([0, 0]);
  });

  it('always adds up, never gives a part more than its weight allows, and keeps equal shares within one unit', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: 0, max: 1_000_000 }), { minLength: 1, maxLength: 12 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (weights, share) => {
          const sum = weights.reduce((a, w) => a + w, 0);
          const total = Math.floor(sum * share);
          const parts = shareOut(total, weights);
          expect(parts.reduce((a, p) => a + p, 0)).toBe(sum === 0 ? 0 : total);
          parts.forEach((p, i) => expect(p).toBeLessThanOrEqual(weights[i]!));
          parts.forEach((p) => expect(p).toBeGreaterThanOrEqual(0));
        },
      ),
    );
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1_000_000 }), fc.integer({ min: 1, max: 9 }), (total, n) => {
        const parts = shareOut(total, Array<number>(n).fill(1));
        expect(Math.max(...parts) - Math.min(...parts)).toBeLessThanOrEqual(1);
        expect([...parts].sort((a, b) => b - a)).toEqual(parts); // the extra units go to the first parts
      }),
    );
  });
});

describe('percent text', () => {
  it('reads and writes thousandths of a percent', () => {
    expect([parsePercent('8.25'), parsePercent('20'), parsePercent('7.125'), parsePercent('0'), parsePercent('.5')]).toEqual([8250, 20_000, 7125, 0, 500]);
    expect(parsePercent('7.1255')).toBe(7126); // beyond three decimals rounds half away from zero
    expect([parsePercent(''), parsePercent('8,25'), parsePercent('abc')]).toEqual([null, null, null]);
    expect([percentText(8250), percentText(20_000), percentText(7125), percentText(0)]).toEqual(['8.25', '20', '7.125', '0']);
  });
});
