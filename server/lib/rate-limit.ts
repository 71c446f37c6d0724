import type { Request } from 'express';
import { rateLimit, type Store } from 'express-rate-limit';
import type { Db } from '@server/db/database';
import { AppError } from './app-error';
import { hitRateLimit, resetRateLimit, unhitRateLimit } from './rate-limits.repository';

/** 429 RATE_LIMITED; the error handler sends `Retry-After` with the seconds to wait. */
export class RateLimitedError extends AppError {
  constructor(
    message: string,
    readonly retryAfterSeconds: number,
  ) {
    super('RATE_LIMITED', 429, message);
  }
}

/** express-rate-limit's counts kept in PostgreSQL (rate_limit_hits), shared by every app server. */
class PostgresStore implements Store {
  localKeys = false;
  windowMs = 60_000;
  constructor(
    private readonly db: Db,
    readonly prefix: string,
  ) {}
  init(options: { windowMs: number }) {
    this.windowMs = options.windowMs;
  }
  async increment(key: string) {
    const { hits, resetAt } = await hitRateLimit(this.db, this.prefix + key, this.windowMs);
    return { totalHits: hits, resetTime: resetAt };
  }
  decrement = (key: string) => unhitRateLimit(this.db, this.prefix + key);
  resetKey = (key: string) => resetRateLimit(this.db, this.prefix + key);
}

/**
 * A rate limit that answers in the API's error shape (429 RATE_LIMITED with `message`), counted in PostgreSQL so
 * it holds however many app servers there are. `name` keeps each limit's counts apart. By the caller's network
 * address unless `key` says otherwise (the address is the proxy's unless TRUST_PROXY trusts it: config.ts).
 */
export function rateLimited(db: Db, opts: { name: string; windowMs: number; limit: number; message: string; key?: (req: Request) => string }) {
  return rateLimit({
    windowMs: opts.windowMs,
    limit: opts.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    store: new PostgresStore(db, `${opts.name}:`),
    // Callers may send X-Forwarded-For; without a trusted proxy it is ignored on purpose (config.ts), not a mistake to log.
    validate: { xForwardedForHeader: false },
    ...(opts.key ? { keyGenerator: opts.key } : {}),
    handler: (_req, _res, next) => next(new AppError('RATE_LIMITED', 429, opts.message)),
  });
}
