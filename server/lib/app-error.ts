import type { ErrorCode } from '@shared/api/error-codes';

/** The one error services throw; the error middleware turns it into `{ error: { code, message, fields? } }`. */
export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    readonly status: number,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
  }
}

export const notFound = (what = 'That record') => new AppError('NOT_FOUND', 404, `${what} was not found.`);
export const forbidden = () => new AppError('FORBIDDEN', 403, 'Your role may not do this.');
/** A 400 whose message names one field, shown beside that field in the form. */
export const invalidField = (field: string, message: string) => new AppError('VALIDATION_FAILED', 400, message, { [field]: message });
