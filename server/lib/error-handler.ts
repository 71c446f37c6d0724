import type { ErrorRequestHandler, RequestHandler } from 'express';
import { NoResultError } from 'kysely';
import { ZodError } from 'zod';
import type { ApiErrorBody } from '@shared/api/error.schemas';
import { AppError } from './app-error';
import { RateLimitedError } from './rate-limit';
import { fieldMessages } from './field-messages';
import { isUniqueViolation, uniqueViolationError } from './unique-violation';
import { ScenarioError } from '@shared/engine/engine';

/** Every error answer carries the request's id (also in `X-Request-Id` and in its log line), so a report can be traced. */
function send(res: Parameters<RequestHandler>[1], status: number, error: Omit<ApiErrorBody['error'], 'requestId'>) {
  res.status(status).json({ error: { ...error, requestId: res.req.id === undefined ? undefined : String(res.req.id) } });
}

/** Unknown /api routes answer JSON 404, never the client app. */
export const apiNotFound: RequestHandler = (req, res) =>
  send(res, 404, { code: 'NOT_FOUND', message: `No API route ${req.method} ${req.originalUrl.split('?')[0]}.` });

// Connection failures (PostgreSQL down or restarting) are reported as 503 so clients retry later.
const DB_DOWN = new Set(['ECONNREFUSED', 'ECONNRESET', '57P01', '57P03', 'ETIMEDOUT']);

/** Maps every thrown error to the API's one error shape; stacks go to the log only (with the request's id). */
export const errorHandler: ErrorRequestHandler = (err, _req, res, _next) => {
  if (res.headersSent) return;
  if (err instanceof RateLimitedError) res.set('Retry-After', String(err.retryAfterSeconds));
  if (err instanceof AppError) return send(res, err.status, { code: err.code, message: err.message, fields: err.fields });
  if (err instanceof ZodError) {
    return send(res, 400, { code: 'VALIDATION_FAILED', message: 'Some fields need attention.', fields: fieldMessages(err) });
  }
  // The engine refusing its input means the request asked for something impossible (e.g. a horizon too long).
  if (err instanceof ScenarioError) {
    return send(res, 400, { code: 'VALIDATION_FAILED', message: err.message, fields: { [err.field]: err.message } });
  }
  // Two requests raced past a check and the database let one in: the other is a conflict, not our failure.
  if (isUniqueViolation(err)) {
    const conflict = uniqueViolationError(err);
    return send(res, conflict.status, { code: conflict.code, message: conflict.message, fields: conflict.fields });
  }
  if (err instanceof NoResultError) return send(res, 404, { code: 'NOT_FOUND', message: 'That record was not found.' });
  // A path like /api/bookings/%ED%A0%80 cannot be decoded (Express's router throws URIError with status 400).
  if (err instanceof URIError) return send(res, 400, { code: 'VALIDATION_FAILED', message: 'The address has a malformed %-escape.' });
  if (err?.type === 'entity.parse.failed') return send(res, 400, { code: 'BAD_JSON', message: 'The request body is not valid JSON.' });
  if (err?.type === 'entity.too.large') return send(res, 413, { code: 'PAYLOAD_TOO_LARGE', message: 'The request body is too large.' });
  if (err?.type === 'charset.unsupported' || err?.type === 'encoding.unsupported') {
    return send(res, 415, { code: 'VALIDATION_FAILED', message: 'Send JSON in UTF-8.' });
  }
  if (DB_DOWN.has(err?.code) || /Connection terminated|timeout exceeded when trying to connect/i.test(err?.message ?? '')) {
    return send(res, 503, { code: 'DB_UNAVAILABLE', message: 'The database is not reachable; try again shortly.' });
  }
  if (err?.code === 'EBADCSRFTOKEN' || err?.code === 'ERR_BAD_CSRF_TOKEN') {
    return send(res, 403, { code: 'CSRF', message: 'The form expired; reload and try again.' });
  }
  // The request's log line (request-log.ts) carries this error with its stack, at error level.
  res.err = err;
  send(res, 500, { code: 'INTERNAL', message: 'Something went wrong on our side.' });
};
