import { describe, expect, it } from 'vitest';
import { typicalMinutesText, typicalWholeMinutes } from './typical-minutes';

describe('typicalWholeMinutes', () => {
  it('rounds the median to the nearest minute and the 80th percentile up', () => {
    expect(typicalWholeMinutes({ visits: 14, medianMinutes: 51.5, p80Minutes: 60.2 })).toEqual({ typical: 52, within: 61 });
    expect(typicalWholeMinutes({ visits: 5, medianMinutes: 22, p80Minutes: 26 })).toEqual({ typical: 22, within: 26 });
  });
  it('reads a floating-point hair over a whole minute as that minute', () => {
    expect(typicalWholeMinutes({ visits: 7, medianMinutes: 25, p80Minutes: 38.00000000000001 })).toEqual({ typical: 25, within: 38 });
  });
  it('never says "within" less than the typical minutes', () => {
    expect(typicalWholeMinutes({ visits: 3, medianMinutes: 30.6, p80Minutes: 30.6 })).toEqual({ typical: 31, within: 31 });
  });
  it('has no number below the least visits', () => {
    expect(typicalWholeMinutes({ visits: 2, medianMinutes: null, p80Minutes: null })).toBeNull();
  });
});

describe('typicalMinutesText', () => {
  it('says the figure with how many visits, or why there is none', () => {
    expect(typicalMinutesText({ visits: 14, medianMinutes: 52, p80Minutes: 61 }, 3)).toBe('typically 52 min (80% within 61) over 14 visits');
    expect(typicalMinutesText({ visits: 2, medianMinutes: null, p80Minutes: null }, 3)).toBe('too few visits to say (2 so far, 3 needed)');
    expect(typicalMinutesText({ visits: 0, medianMinutes: null, p80Minutes: null }, 3)).toBe('no finished visits yet');
  });
});
