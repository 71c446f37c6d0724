import { PERCENT_SCALE } from './percent';

/*
 * The two ways money is rounded (docs/money.md, "Money arithmetic"): a rate applied to an amount rounds to the
 * nearest minor unit with a half going up, and an amount shared out between parts gives the left-over minor
 * units to the largest remainders. Products are taken in BigInt so no intermediate value loses digits.
 */

/** numerator / denominator to the nearest whole number, a half going up (both non-negative). */
export function divideHalfUp(numerator: bigint, denominator: bigint): number {
  return Number((2n * numerator + denominator) / (2n * denominator));
}

/** `milliPercent` thousandths of a percent of `amount` minor units, rounded half up: 8.25 % of 37450 is 3089.625 → 3090. */
export function percentOf(amount: number, milliPercent: number): number {
  return divideHalfUp(BigInt(amount) * BigInt(milliPercent), BigInt(PERCENT_SCALE));
}

/**
 * The tax inside an amount that includes it, rounded half up: amount × rate / (100 % + rate).
 * 20 % inside 13850 is 13850 / 6 = 2308.33 → 2308.
 */
export function taxInside(amount: number, milliPercent: number): number {
  return divideHalfUp(BigInt(amount) * BigInt(milliPercent), BigInt(PERCENT_SCALE + milliPercent));
}

/**
 * `total` minor units shared out in proportion to `weights` (the largest remainder method): each part gets the
 * whole units of its exact share, and the units left over go one each to the parts with the largest remainders,
 * an earlier part first on a tie. The parts always add up to `total`. Equal weights give equal shares with the
 * remainder to the first parts: 1000 between three is 334, 333, 333.
 */
export function shareOut(total: number, weights: readonly number[]): number[] {
  const sum = weights.reduce((a, w) => a + BigInt(w), 0n);
  if (sum === 0n) return weights.map(() => 0);
  const exact = weights.map((w, index) => {
    const scaled = BigInt(total) * BigInt(w);
    return { index, whole: Number(scaled / sum), remainder: scaled % sum };
  });
  let left = total - exact.reduce((a, p) => a + p.whole, 0);
  const byRemainder = [...exact].sort((a, b) => (a.remainder === b.remainder ? a.index - b.index : a.remainder > b.remainder ? -1 : 1));
  for (const part of byRemainder) {
    if (left === 0) break;
    if (part.remainder === 0n) continue;
    part.whole += 1;
    left -= 1;
  }
  return exact.map((p) => p.whole);
}
