/**
 * The skin-test rule in the words clients and staff read, one wording everywhere (cautions, salon page, messages,
 * booking pages). The test follows the colour maker's instructions (Cosmetics Europe Recommendation No 27, 2023:
 * read 48 hours after it is applied); any reaction stops oxidative colour until it is cleared.
 */
export function skinTestWords(leadHours: number): string {
  return `Oxidative colour needs a skin test: applied at least ${leadHours} hours before your colour appointment and read before it, following the colour maker's instructions. Any reaction means no oxidative colour until it has been cleared (for example on a doctor's written advice).`;
}

/** How long a negative test counts, in months as a client reads it. */
export function skinTestValidityWords(validityDays: number): string {
  return `A new test is needed when your last one is more than ${Math.round(validityDays / 30)} months old; the colour maker may ask for one before every colouring.`;
}
