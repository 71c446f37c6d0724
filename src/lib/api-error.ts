import type { ErrorCode } from '@shared/api/error-codes';

/** What every failed API call throws: the server's error code, status and per-field messages. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: ErrorCode | 'NETWORK';
  readonly fields: Record<string, string>;

  constructor(status: number, code: ErrorCode | 'NETWORK', message: string, fields: Record<string, string> = {}) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.fields = fields;
  }
}

export function isApiError(error: unknown, code?: ApiError['code']): error is ApiError {
  return error instanceof ApiError && (code === undefined || error.code === code);
}

/**
 * A refusal in words a person can act on: the server's message, or for a 400 on fields the fields' own messages
 * ("That time has already passed.") instead of the general "Some fields need attention.".
 */
export function problemText(error: unknown): string {
  if (!(error instanceof ApiError)) return error instanceof Error ? error.message : 'Something went wrong. Please try again.';
  const fields = Object.values(error.fields);
  return fields.length ? fields.join(' ') : error.message;
}
