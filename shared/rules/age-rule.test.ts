import { describe, expect, it } from 'vitest';
import { ageOn, underAgeOnAny } from './age-rule';

// Worked by hand: someone born 15 March 2011 is 15 on 14 March 2027 and 16 on 15 March 2027. Someone born on
// 29 February 2012 has no birthday in 2027 and is counted 15 until 1 March 2027 (the day after 28 February),
// and 16 on 29 February 2028 (a leap year).
describe('ageOn', () => {
  it('counts whole years, the birthday itself starting the new one', () => {
    expect(ageOn('2011-03-15', '2027-03-14')).toBe(15);
    expect(ageOn('2011-03-15', '2027-03-15')).toBe(16);
    expect(ageOn('2011-03-15', '2026-12-31')).toBe(15);
  });

  it('handles a 29 February birthday', () => {
    expect(ageOn('2012-02-29', '2027-02-28')).toBe(14);
    expect(ageOn('2012-02-29', '2027-03-01')).toBe(15);
    expect(ageOn('2012-02-29', '2028-02-28')).toBe(15);
    expect(ageOn('2012-02-29', '2028-02-29')).toBe(16);
  });
});

describe('underAgeOnAny', () => {
  it('is true when any colour sitting falls before the 16th birthday, and never without a date of birth', () => {
    expect(underAgeOnAny('2011-03-15', ['2027-03-20'])).toBe(false);
    expect(underAgeOnAny('2011-03-15', ['2027-03-10', '2027-03-20'])).toBe(true);
    expect(underAgeOnAny(null, ['2027-03-10'])).toBe(false);
  });
});
