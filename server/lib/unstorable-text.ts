import { AppError } from './app-error';

// PostgreSQL text cannot hold a NUL character, and a lone UTF-16 surrogate (half of an emoji) is not valid UTF-8:
// either makes the database answer an error. Every route's input is checked here once, before any schema or query.
// eslint-disable-next-line no-control-regex -- NUL is the character this looks for
const UNSTORABLE = /\u0000|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/;
const MESSAGE = 'Contains a character that cannot be stored (a NUL byte or half of an emoji)';

/** The path of the first string (or object key) that cannot be stored, or null. */
export function unstorablePath(value: unknown, path: string[] = [], depth = 0): string | null {
  if (typeof value === 'string') return UNSTORABLE.test(value) ? path.join('.') || 'body' : null;
  if (depth > 32 || value === null || typeof value !== 'object') return null;
  for (const [key, inner] of Object.entries(value)) {
    if (UNSTORABLE.test(key)) return [...path, '(a key)'].join('.');
    const found = unstorablePath(inner, [...path, key], depth + 1);
    if (found) return found;
  }
  return null;
}

/** Throws 400 naming the field when a request's params, query or body hold text PostgreSQL cannot store. */
export function assertStorable(parts: { params?: unknown; query?: unknown; body?: unknown }): void {
  for (const part of [parts.params, parts.query, parts.body]) {
    const path = unstorablePath(part);
    if (path) throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', { [path]: MESSAGE });
  }
}
