/**
 * The `tel:` link of a stored phone number: its digits and a leading +, which is what RFC 3966 lets a telephone URI
 * carry without separators (a number stored as typed, "+1 970 555 0148", dials the same as its E.164 form).
 */
export const telHref = (stored: string): string => `tel:${stored.replace(/[^\d+]/g, '')}`;
