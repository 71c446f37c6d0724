import { describe, expect, it } from 'vitest';
import { productUse } from './product-use';

// Every expected value below is worked by hand in the comment beside it (grams × cents per gram); the costs
// per gram are invented for the examples, not market prices.

describe('product used at a sitting, each part as itself', () => {
  it('a bowl of 30 g lightener and 60 g developer is 30 g lightener and 60 g developer, not 90 g lightener', () => {
    // Lightener 30 g × 4.5 ¢/g = 135 ¢; developer 60 g × 1.2 ¢/g = 72 ¢; 30 + 60 = 90 g; 135 + 72 = 207 ¢ ($2.07).
    const use = productUse(
      [
        { kind: 'lightener', grams: 30 },
        { kind: 'developer', grams: 60 },
      ],
      { lightener: 4.5, developer: 1.2 },
    );
    expect(use.totals).toEqual([
      { kind: 'lightener', grams: 30, centsPerGram: 4.5, costCents: 135 },
      { kind: 'developer', grams: 60, centsPerGram: 1.2, costCents: 72 },
    ]);
    expect(use.totalGrams).toBe(90);
    expect(use.estimatedCostCents).toBe(207);
  });

  it('says developer has no cost when the salon has set none, and the estimate is then unknown (not too low)', () => {
    // Lightener 30 g × 4.5 ¢/g = 135 ¢ still shows; developer 60 g has no cost, so the sitting's estimate is unknown.
    const use = productUse(
      [
        { kind: 'lightener', grams: 30 },
        { kind: 'developer', grams: 60 },
      ],
      { lightener: 4.5 },
    );
    expect(use.totals[1]).toEqual({ kind: 'developer', grams: 60, centsPerGram: null, costCents: null });
    expect(use.totals[0]?.costCents).toBe(135);
    expect(use.estimatedCostCents).toBeNull();
  });

  it('adds bowls by kind: developer from every bowl together, water weighed but not costed', () => {
    // Bowl 1: lightener 30 g + developer 60 g. Bowl 2: toner 20 g + developer 30 g + water 10 g.
    // Lightener 30 g × 4 ¢ = 120 ¢; toner 20 g × 7.5 ¢ = 150 ¢; developer 60 + 30 = 90 g × 1.5 ¢ = 135 ¢;
    // other 10 g not costed. Grams 30 + 20 + 90 + 10 = 150 g; cost 120 + 150 + 135 = 405 ¢.
    const use = productUse(
      [
        { kind: 'developer', grams: 60 },
        { kind: 'lightener', grams: 30 },
        { kind: 'toner', grams: 20 },
        { kind: 'developer', grams: 30 },
        { kind: 'other', grams: 10 },
      ],
      { lightener: 4, toner: 7.5, developer: 1.5 },
    );
    expect(use.totals.map((t) => [t.kind, t.grams, t.costCents])).toEqual([
      ['lightener', 30, 120],
      ['toner', 20, 150],
      ['developer', 90, 135],
      ['other', 10, null],
    ]);
    expect(use.totalGrams).toBe(150);
    expect(use.estimatedCostCents).toBe(405);
  });

  it('keeps tenths of a gram and rounds each line to whole cents', () => {
    // 0.1 + 0.2 g of bond builder = 0.3 g (scales show tenths); 33.3 g toner × 2.5 ¢ = 83.25 ¢ → 83 ¢;
    // 0.3 g × 30 ¢ = 9 ¢; 83 + 9 = 92 ¢; 33.3 + 0.3 = 33.6 g.
    const use = productUse(
      [
        { kind: 'bond_builder', grams: 0.1 },
        { kind: 'bond_builder', grams: 0.2 },
        { kind: 'toner', grams: 33.3 },
      ],
      { toner: 2.5, bond_builder: 30 },
    );
    expect(use.totals).toEqual([
      { kind: 'toner', grams: 33.3, centsPerGram: 2.5, costCents: 83 },
      { kind: 'bond_builder', grams: 0.3, centsPerGram: 30, costCents: 9 },
    ]);
    expect(use.totalGrams).toBe(33.6);
    expect(use.estimatedCostCents).toBe(92);
  });

  it('a sitting without bowls used nothing and cost nothing', () => {
    expect(productUse([], {})).toEqual({ totals: [], totalGrams: 0, estimatedCostCents: 0 });
  });
});
