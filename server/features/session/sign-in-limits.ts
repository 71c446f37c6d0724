/**
 * How many password checks an account and an address get. Common practice for sign-in throttling: a handful of
 * failures per account, more per network address, and a wait that grows the longer the guessing goes on, rather
 * than a lock-out an attacker could use to keep the owner out.
 *
 * - Per account: 5 failed checks in 15 minutes, 10 in 2 hours, 20 in 24 hours; then the next check waits until
 *   the oldest of those leaves its window. An address the account has signed in from (in the last 90 days) has an
 *   allowance of its own, so strangers' guesses never hold up the owner on their usual device.
 * - Per address: 20 failed checks in 15 minutes, whatever the accounts.
 */
export const SIGN_IN_LIMITS = {
  perAccount: [
    { failures: 5, minutes: 15 },
    { failures: 10, minutes: 120 },
    { failures: 20, minutes: 24 * 60 },
  ],
  perAddress: { failures: 20, minutes: 15 },
  knownAddressDays: 90,
} as const;

/** The longest window the account limits look back over, in days. */
export const ACCOUNT_LOOKBACK_DAYS = Math.max(...SIGN_IN_LIMITS.perAccount.map((l) => l.minutes)) / (24 * 60);

/** Milliseconds until the account may be checked again, given its counted failures (newest first); 0 when now. */
export function accountWait(failures: Date[], now: Date): number {
  let wait = 0;
  for (const limit of SIGN_IN_LIMITS.perAccount) {
    // With the n-th newest failure inside the window, n failures are: the next check waits until it leaves.
    const nth = failures[limit.failures - 1];
    if (nth) wait = Math.max(wait, nth.getTime() + limit.minutes * 60_000 - now.getTime());
  }
  return wait;
}
