import { ERROR_CODES, type ErrorCode } from '@shared/api/error-codes';
import type { ApiErrorBody } from '@shared/api/error.schemas';

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

const CODES: ReadonlySet<string> = new Set(ERROR_CODES);
const isText = (value: unknown): value is string => typeof value === 'string';
const isRecord = (value: unknown): value is Record<string, unknown> => typeof value === 'object' && value !== null && !Array.isArray(value);

/**
 * The error of an API error body (`{ error: { code, message, fields? } }`, ApiErrorBodySchema), or null when the
 * body is not one. Checked by hand: every page's first load reads errors, and must not carry zod's runtime.
 */
export function errorBodyOf(body: unknown): ApiErrorBody['error'] | null {
  const error = isRecord(body) ? body.error : undefined;
  if (!isRecord(error) || !isText(error.code) || !CODES.has(error.code) || !isText(error.message)) return null;
  const { fields, requestId } = error;
  if (fields !== undefined && !(isRecord(fields) && Object.values(fields).every(isText))) return null;
  if (requestId !== undefined && !isText(requestId)) return null;
  return {
    code: error.code as ErrorCode,
    message: error.message,
    ...(fields && { fields: fields as Record<string, string> }),
    ...(requestId !== undefined && { requestId }),
  };
}
