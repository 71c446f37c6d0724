import { describe, expect, it } from 'vitest';
import { accountWait } from './sign-in-limits';

const now = new Date('2027-03-14T12:00:00Z');
const ago = (minutes: number) => new Date(now.getTime() - minutes * 60_000);
const MIN = 60_000;

// The limits are common practice for sign-in throttling (a handful per account, a growing wait), not a standard.
describe('accountWait', () => {
  it('lets the first four failures in 15 minutes be followed by another check at once', () => {
    expect(accountWait([], now)).toBe(0);
    expect(accountWait([ago(1), ago(2), ago(3), ago(4)], now)).toBe(0);
  });

  it('after 5 failures in 15 minutes, waits until the oldest of them is 15 minutes old', () => {
    expect(accountWait([ago(1), ago(2), ago(3), ago(4), ago(10)], now)).toBe(5 * MIN);
    expect(accountWait([ago(1), ago(2), ago(3), ago(4), ago(16)], now)).toBe(0);
  });

  it('grows the wait as guessing goes on: 10 failures in 2 hours, 20 in a day', () => {
    const tenInTwoHours = Array.from({ length: 10 }, (_, i) => ago(20 + i * 10)); // 20…110 minutes ago
    expect(accountWait(tenInTwoHours, now)).toBe(10 * MIN); // the 10th (110 minutes ago) leaves the 2-hour window in 10
    const twentyInADay = Array.from({ length: 20 }, (_, i) => ago(130 + i * 60)); // the oldest 1,270 minutes ago
    expect(accountWait(twentyInADay, now)).toBe((24 * 60 - 1270) * MIN);
  });
});
