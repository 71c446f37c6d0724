/**
 * The skin-test rule for oxidative colour, as a pure function. Common practice (Cosmetics Europe
 * Recommendation No 27, 2023): an allergy alert test is read 48 hours after it is applied, and colour may
 * follow only when it showed no reaction. Salons set the lead time and how long a negative test stays valid.
 */
export interface SkinTestRecord {
  appliedAt: Date;
  result: 'pending' | 'negative' | 'positive' | 'unclear';
}

export interface SkinTestPolicy {
  leadHours: number;
  validityDays: number;
}

export interface SkinTestVerdict {
  required: boolean;
  ok: boolean;
  message: string;
  /** Colour may not start before this. */
  earliestAllowed: Date | null;
  /** Colour may not start after this (the test's validity ends). */
  latestAllowed: Date | null;
}

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
const day = (d: Date) => d.toISOString().slice(0, 10);

/**
 * @param tests the client's skin tests (any order); a booked, not yet done skin-test appointment counts as a pending test
 */
export function checkSkinTest(needsTest: boolean, tests: SkinTestRecord[], policy: SkinTestPolicy, now: Date): SkinTestVerdict {
  if (!needsTest) return { required: false, ok: true, message: 'This service needs no skin test.', earliestAllowed: null, latestAllowed: null };
  const latest = [...tests].sort((a, b) => b.appliedAt.getTime() - a.appliedAt.getTime())[0];
  const blocked = (message: string): SkinTestVerdict => ({ required: true, ok: false, message, earliestAllowed: null, latestAllowed: null });
  if (!latest) {
    return blocked(`No skin test is on record. Book a skin test first: colour can follow ${policy.leadHours} hours after it, once it reads negative.`);
  }
  if (latest.result === 'positive') {
    return blocked(`The skin test of ${day(latest.appliedAt)} showed a reaction. Oxidative colour must not be booked for this client.`);
  }
  if (latest.result === 'unclear') {
    return blocked(`The skin test of ${day(latest.appliedAt)} was unclear. Repeat the test before booking oxidative colour.`);
  }
  const validUntil = new Date(latest.appliedAt.getTime() + policy.validityDays * DAY);
  if (validUntil <= now) {
    return blocked(`The last skin test (${day(latest.appliedAt)}) is older than ${policy.validityDays} days. Book a new skin test first.`);
  }
  const earliest = new Date(latest.appliedAt.getTime() + policy.leadHours * HOUR);
  const pending = latest.result === 'pending';
  return {
    required: true,
    ok: true,
    message: pending
      ? `A skin test is applied or booked for ${day(latest.appliedAt)}; colour can start ${policy.leadHours} hours after it, only if it reads negative.`
      : `Negative skin test of ${day(latest.appliedAt)}; valid until ${day(validUntil)}.`,
    earliestAllowed: earliest,
    latestAllowed: validUntil,
  };
}
