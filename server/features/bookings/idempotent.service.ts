import type { Db } from '@server/db/database';
import { AppError } from '@server/lib/app-error';
import { sha256 } from '@server/lib/hash';
import { claimIdempotencyKey, findIdempotent, saveIdempotent } from './idempotency.repository';

/** JSON with every object's keys sorted, so one request always has one fingerprint whatever order its fields came in. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
    return `{${entries
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
      .map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`)
      .join(',')}}`;
  }
  return JSON.stringify(value) ?? 'null';
}

export interface IdempotentRequest {
  userId: string;
  key: string;
  /** `METHOD /path` of the endpoint: a key belongs to one kind of request. */
  route: string;
  /** The parsed request the key was sent with (its fingerprint is kept with the key). */
  request: unknown;
}

/**
 * Runs `work` once per user and idempotency key, inside the caller's transaction `trx`, and keeps its result (JSON)
 * under the key. The key is claimed first, so a retry racing its original waits for it and then answers the
 * original's result; the same key sent with a different request is refused with 422 naming the key, never
 * answered with another request's result.
 */
export async function oncePerKey<R>(trx: Db, req: IdempotentRequest, work: () => Promise<R>, status = 201): Promise<R> {
  const requestHash = sha256(canonical(req.request));
  if (await claimIdempotencyKey(trx, req.userId, req.key, req.route, requestHash)) {
    const result = await work();
    await saveIdempotent(trx, req.userId, req.key, status, result);
    return result;
  }
  const earlier = await findIdempotent(trx, req.userId, req.key);
  if (!earlier) throw new AppError('CONFLICT', 409, 'The same request is being handled already; try again in a moment.');
  if (earlier.route !== req.route || (earlier.requestHash !== null && earlier.requestHash !== requestHash)) {
    const message = 'This idempotency key was already used for a different request; send a new key with a new request.';
    throw new AppError('IDEMPOTENCY_KEY_REUSED', 422, message, { idempotencyKey: message });
  }
  return earlier.response as R;
}
