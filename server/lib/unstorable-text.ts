import { UNSTORABLE, UNSTORABLE_MESSAGE as MESSAGE } from '@shared/schemas/common.schemas';
import { AppError } from './app-error';

// PostgreSQL text cannot hold a NUL character, and a lone UTF-16 surrogate (half of an emoji) is not valid UTF-8:
// either makes the database answer an error. Every route's input is checked here once, before any schema or query,
// with the same pattern the shared text schema uses.

/** The paths of the strings (or object keys) that cannot be stored (at most `limit` of them). */
export function unstorablePaths(value: unknown, path: string[] = [], depth = 0, found: string[] = [], limit = 20): string[] {
  if (found.length >= limit) return found;
  if (typeof value === 'string') {
    if (UNSTORABLE.test(value)) found.push(path.join('.') || 'body');
    return found;
  }
  if (depth > 32 || value === null || typeof value !== 'object') return found;
  for (const [key, inner] of Object.entries(value)) {
    if (UNSTORABLE.test(key)) found.push([...path, '(a key)'].join('.'));
    else unstorablePaths(inner, [...path, key], depth + 1, found, limit);
  }
  return found;
}

/** Throws 400 naming every such field when a request's params, query or body hold text PostgreSQL cannot store. */
export function assertStorable(parts: { params?: unknown; query?: unknown; body?: unknown }): void {
  const paths = [parts.params, parts.query, parts.body].flatMap((part) => unstorablePaths(part));
  if (paths.length) throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', Object.fromEntries(paths.map((p) => [p, MESSAGE])));
}
