import { describe, expect, it } from 'vitest';
import { checkSkinTest } from './skin-test-rule';

// Lead time 48 h: Cosmetics Europe Recommendation No 27 "Allergy Alert Test for hair colouring products"
// (24 Apr 2023, as summarised by CTPA): if no reaction within 48 h, colour may be applied.
// Validity 182 days: common practice (re-test when the last test is over about 6 months old).
const policy = { leadHours: 48, validityDays: 182 };
const now = new Date('2027-03-01T12:00:00Z');

describe('checkSkinTest', () => {
  it('services without oxidative colour need no test', () => {
    expect(checkSkinTest(false, [], policy, now)).toMatchObject({ required: false, ok: true });
  });

  it('with no test on record, blocks and says to book one first', () => {
    const v = checkSkinTest(true, [], policy, now);
    expect(v.ok).toBe(false);
    expect(v.message).toMatch(/Book a skin test first/);
  });

  it('a negative test allows colour from exactly 48 h after it was applied', () => {
    const v = checkSkinTest(true, [{ appliedAt: new Date('2027-02-27T15:00:00Z'), result: 'negative' }], policy, now);
    expect(v.ok).toBe(true);
    expect(v.earliestAllowed?.toISOString()).toBe('2027-03-01T15:00:00.000Z');
    expect(v.latestAllowed?.toISOString()).toBe('2027-08-28T15:00:00.000Z'); // + 182 days
  });

  it('the latest test decides: a positive result after an older negative one blocks', () => {
    const v = checkSkinTest(
      true,
      [
        { appliedAt: new Date('2027-01-10T15:00:00Z'), result: 'negative' },
        { appliedAt: new Date('2027-02-20T15:00:00Z'), result: 'positive' },
      ],
      policy,
      now,
    );
    expect(v.ok).toBe(false);
    expect(v.message).toMatch(/reaction/);
  });

  it('an unclear result blocks until the test is repeated', () => {
    expect(checkSkinTest(true, [{ appliedAt: new Date('2027-02-20T15:00:00Z'), result: 'unclear' }], policy, now).ok).toBe(false);
  });

  it('a negative test older than the validity period no longer counts', () => {
    const v = checkSkinTest(true, [{ appliedAt: new Date('2026-08-01T15:00:00Z'), result: 'negative' }], policy, now);
    expect(v.ok).toBe(false);
    expect(v.message).toMatch(/older than 182 days/);
  });

  it('a pending or booked test allows booking from its time + 48 h, on condition of a negative reading', () => {
    const v = checkSkinTest(true, [{ appliedAt: new Date('2027-03-04T17:00:00Z'), result: 'pending' }], policy, now);
    expect(v.ok).toBe(true);
    expect(v.earliestAllowed?.toISOString()).toBe('2027-03-06T17:00:00.000Z');
    expect(v.message).toMatch(/only if it reads negative/);
  });
});
