import type { Request } from 'express';
import { rateLimit } from 'express-rate-limit';
import { AppError } from './app-error';

/** A rate limit that answers in the API's error shape (429 RATE_LIMITED with `message`). */
export function rateLimited(opts: { windowMs: number; limit: number; message: string; key?: (req: Request) => string }) {
  return rateLimit({
    windowMs: opts.windowMs,
    limit: opts.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    ...(opts.key ? { keyGenerator: opts.key } : {}),
    handler: (_req, _res, next) => next(new AppError('RATE_LIMITED', 429, opts.message)),
  });
}
