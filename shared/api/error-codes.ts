/** Every error code the API can answer with; clients branch on these, never on message text. */
export const ERROR_CODES = [
  'VALIDATION_FAILED',
  'BAD_JSON',
  'PAYLOAD_TOO_LARGE',
  'UNAUTHENTICATED',
  'INVALID_CREDENTIALS',
  'FORBIDDEN',
  'CSRF',
  'NOT_FOUND',
  'CONFLICT',
  'EMAIL_TAKEN',
  'RESET_TOKEN_INVALID',
  'SKIN_TEST',
  'AGE_CONSENT',
  'STRAND_TEST',
  'NOT_BOOKABLE',
  'STALE_FIX',
  'PAYMENT_DECLINED',
  'HOLD_LAPSED',
  'HOLD_OPEN',
  'RATE_LIMITED',
  'DB_UNAVAILABLE',
  'BUSY',
  'INTERNAL',
] as const;

export type ErrorCode = (typeof ERROR_CODES)[number];
