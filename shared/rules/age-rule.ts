/**
 * Age and oxidative colour. Oxidative hair dyes carry the EU label warning "This product is not intended for use on
 * persons under the age of 16" (Regulation (EC) No 1223/2009, Annex III). It is a warning, not a ban: Dwell refuses
 * such colour online for a client under 16 on the day of the sitting, and the desk may book it only with a guardian's
 * consent on record. Local rules and licensed practice come first.
 */

export const MIN_AGE_WITHOUT_CONSENT = 16;

/** Whole years from a date of birth to a date (both YYYY-MM-DD): the birthday itself counts as the new year. */
export function ageOn(dateOfBirth: string, on: string): number {
  // A missing part reads as NaN, as Number(undefined) would: the age is then NaN, never under 16.
  const [by = NaN, bm = NaN, bd = NaN] = dateOfBirth.split('-').map(Number);
  const [y = NaN, m = NaN, d = NaN] = on.split('-').map(Number);
  const hadBirthday = m > bm || (m === bm && d >= bd);
  return y - by - (hadBirthday ? 0 : 1);
}

/** Whether any of these sitting dates (YYYY-MM-DD, salon time) falls before the client turns 16. */
export function underAgeOnAny(dateOfBirth: string | null, dates: readonly string[]): boolean {
  return dateOfBirth !== null && dates.some((d) => ageOn(dateOfBirth, d) < MIN_AGE_WITHOUT_CONSENT);
}
