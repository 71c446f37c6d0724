import { describe, expect, it } from 'vitest';
import {
  CalculatorError,
  EU_HAIR_MAX_PERCENT,
  GRAMS_PER_LITRE_PER_VOLUME,
  PERCENT_PER_VOLUME,
  bowlPercent,
  checkDeveloperStrength,
  dilute,
  mixTwoDevelopers,
  parseRatio,
  percentToVolume,
  ratioBowlPercent,
  splitBowl,
  strengthWords,
  volumeToPercent,
} from './developer';

const fieldOf = (fn: () => unknown) => {
  try {
    fn();
  } catch (e) {
    if (e instanceof CalculatorError) return e.field;
    throw e;
  }
  return null;
};

describe('volume ↔ percent', () => {
  it('uses the volume definition: 1 L releases x L of O2 at 0 °C, 101.325 kPa, 2 H2O2 → 2 H2O + O2', () => {
    // Source: definition as in the AMA Handbook of Useful Drugs (1913) and USP Hydrogen Peroxide Topical
    // Solution; V_m from CODATA 2018, M(H2O2) from IUPAC atomic weights. 2 × 34.0147 / 22.41397 = 3.0351 g/L.
    expect(GRAMS_PER_LITRE_PER_VOLUME).toBeCloseTo(3.0351, 4);
    expect(PERCENT_PER_VOLUME).toBeCloseTo(0.30351, 5);
    // 20 vol = 20 L O2 per L = 20 / 22.414 mol O2 = 2 × that mol H2O2 × 34.0147 g/mol = 60.70 g/L = 6.070 % w/v.
    expect(volumeToPercent(20)).toBeCloseTo(6.07, 2);
  });

  it.each([
    [10, 3],
    [20, 6],
    [30, 9],
    [40, 12],
  ])('%i vol ≈ %i %% (±0.2) and back', (vol, pct) => {
    // Sources: 1 vol = 2·M(H2O2)/V_m = 2 × 34.0147 / 22.41397 = 3.035 g/L (IUPAC atomic weights; CODATA 2018 molar volume at 101.325 kPa), so 3.035/6.070/9.105/12.141 %; USP 2.5–3.5 g/100 mL for the
    // 10-vol grade; EU Reg. 1223/2009 Annex III entry 12(a) "12 % of H2O2 (40 volumes)".
    expect(Math.abs(volumeToPercent(vol) - pct)).toBeLessThanOrEqual(0.2);
    expect(Math.abs(percentToVolume(pct) - vol)).toBeLessThanOrEqual(0.2 / 0.3);
    expect(volumeToPercent(vol, { trade: true })).toBeCloseTo(pct, 10);
    expect(percentToVolume(pct, { trade: true })).toBeCloseTo(vol, 10);
  });

  it('USP: the 10-vol grade lies within 2.5–3.5 g per 100 mL', () => {
    // Source: USP 28–31, Hydrogen Peroxide Topical Solution.
    expect(volumeToPercent(10)).toBeGreaterThanOrEqual(2.5);
    expect(volumeToPercent(10)).toBeLessThanOrEqual(3.5);
  });
});

describe("strengths in the trade's words, percent with volumes", () => {
  it.each([
    [3, '3 % (10 vol)'],
    [6, '6 % (20 vol)'],
    [9, '9 % (30 vol)'],
    [12, '12 % (40 vol)'],
  ])('%i %% reads "%s"', (pct, words) => {
    // Source: EU Reg. (EC) 1223/2009 Annex III entry 12 writes the limit "12 % of H2O2 (40 volumes)"; developer
    // bottles are labelled 3/6/9/12 % = 10/20/30/40 vol (common practice: 1 vol ≈ 0.3 %).
    expect(strengthWords(pct)).toBe(words);
  });

  it('gives any other strength to a tenth: 15 % = 50 vol, 4 % = 13.3 vol, 2.7 % = 9 vol', () => {
    // By hand at 0.3 % per volume: 15 / 0.3 = 50; 4 / 0.3 = 13.33… → 13.3; 2.7 / 0.3 = 9.
    expect(strengthWords(15)).toBe('15 % (50 vol)');
    expect(strengthWords(4)).toBe('4 % (13.3 vol)');
    expect(strengthWords(2.7)).toBe('2.7 % (9 vol)');
  });
});

describe('the salon maximum', () => {
  it('defaults to the EU limit of 12 % and refuses more, naming the field', () => {
    // Source: EU Reg. (EC) 1223/2009 Annex III entry 12(a) as substituted by Reg. (EU) 2019/831: hair products 12 %.
    expect(EU_HAIR_MAX_PERCENT).toBe(12);
    expect(() => checkDeveloperStrength(12, EU_HAIR_MAX_PERCENT)).not.toThrow();
    expect(fieldOf(() => checkDeveloperStrength(12.5, EU_HAIR_MAX_PERCENT))).toBe('developerPercent');
    expect(fieldOf(() => checkDeveloperStrength(-1, 12))).toBe('developerPercent');
  });

  it('says the refused and the allowed strength in volumes too, and the EU limit as the regulation writes it', () => {
    // 15 / 0.3 = 50 vol; 12 / 0.3 = 40 vol (common practice factor). The limit's words: Annex III entry 12.
    expect(() => checkDeveloperStrength(15, 12)).toThrow(/15 % \(50 vol\) is above this salon's maximum of 12 % \(40 vol\)/);
    expect(() => checkDeveloperStrength(15, 12)).toThrow(/12 % of H2O2, 40 volumes/);
    // A salon in a stricter jurisdiction sets 9 %: 9 / 0.3 = 30 vol.
    expect(() => checkDeveloperStrength(10, 9)).toThrow(/maximum of 9 % \(30 vol\)/);
  });
});

describe('mixing (C1·m1 = C2·m2), worked by hand', () => {
  it('1 part 12 % + 1 part cream → 6 %', () => {
    // (12 × 1 + 0 × 1) / (1 + 1) = 12 / 2 = 6. Source: the weighted mean of the two strengths, worked by hand.
    expect(
      bowlPercent([
        { grams: 50, peroxidePercent: 12 },
        { grams: 50, peroxidePercent: 0 },
      ]),
    ).toBeCloseTo(6, 10);
    // Diluting to 6 % in a 60 g bowl: developer = 60 × (6 − 0) / (12 − 0) = 30 g, cream = 60 − 30 = 30 g.
    expect(dilute({ percent: 12, targetPercent: 6, totalGrams: 60 })).toEqual({ developerGrams: 30, diluentGrams: 30 });
  });

  it('colour 1 : developer 1.5 at 9 % → 5.4 % on the head', () => {
    // (0 × 1 + 9 × 1.5) / (1 + 1.5) = 13.5 / 2.5 = 5.4. Source: the weighted mean of the two strengths, worked by hand.
    expect(ratioBowlPercent('1:1.5', 9)).toBeCloseTo(5.4, 10);
    // A 100 g bowl at 1:1.5: colour = 100 × 1 / 2.5 = 40 g, developer = 100 × 1.5 / 2.5 = 60 g.
    expect(splitBowl('1:1.5', 100)).toEqual([40, 60]);
  });

  it('two developers to a target: 6 % and 12 % to 9 % in 80 g', () => {
    // higher = 80 × (9 − 6) / (12 − 6) = 80 × 3 / 6 = 40 g; lower = 80 − 40 = 40 g. Check: (6·40 + 12·40) / 80 = 9.
    expect(mixTwoDevelopers({ lowerPercent: 6, higherPercent: 12, targetPercent: 9, totalGrams: 80 })).toEqual({ lowerGrams: 40, higherGrams: 40 });
    // 3 % and 9 % to 4.5 % in 60 g: higher = 60 × 1.5 / 6 = 15 g; lower = 45 g. Check: (3·45 + 9·15) / 60 = 270 / 60 = 4.5.
    expect(mixTwoDevelopers({ lowerPercent: 3, higherPercent: 9, targetPercent: 4.5, totalGrams: 60 })).toEqual({ lowerGrams: 45, higherGrams: 15 });
  });
});

describe('bad input names the field', () => {
  it('refuses ratios like "1:0", "1", "a:b" and "1:-2"', () => {
    for (const bad of ['1:0', '1', 'a:b', '1:-2', '1::2']) expect(fieldOf(() => parseRatio(bad))).toBe('ratio');
    expect(parseRatio('1 : 2')).toEqual([1, 2]);
  });

  it('refuses negative grams and targets outside the two strengths or above the maximum', () => {
    expect(fieldOf(() => splitBowl('1:1', -5))).toBe('totalGrams');
    expect(fieldOf(() => bowlPercent([{ grams: -1, peroxidePercent: 6 }]))).toBe('parts.0.grams');
    expect(fieldOf(() => mixTwoDevelopers({ lowerPercent: 6, higherPercent: 9, targetPercent: 3, totalGrams: 50 }))).toBe('targetPercent');
    expect(fieldOf(() => mixTwoDevelopers({ lowerPercent: 6, higherPercent: 18, targetPercent: 15, totalGrams: 50 }))).toBe('targetPercent');
    expect(fieldOf(() => mixTwoDevelopers({ lowerPercent: 9, higherPercent: 6, targetPercent: 7, totalGrams: 50 }))).toBe('higherPercent');
    expect(fieldOf(() => bowlPercent([]))).toBe('parts');
  });
});
