/**
 * Intl puts no-break spaces in some outputs ("3:00 PM" with U+202F on some ICU versions, "KWD 2.500"
 * with U+00A0). Texts go into SMS, whose GSM 03.38 alphabet has neither, and tests compare plain
 * text, so every formatted text uses ordinary spaces.
 */
export const plainSpaces = (text: string): string => text.replace(/[\u00a0\u2009\u202f]/g, ' ');
