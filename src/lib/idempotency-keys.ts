import { isApiError } from './api-error';

/**
 * One key per click on a booking action, kept while its answer is unknown: a retry of
 * the same click (after a network or server failure) sends the same key, so the server
 * answers the first result instead of booking twice. A definite answer frees the key.
 */
export class IdempotencyKeys {
  private readonly keys = new Map<string, string>();
  constructor(private readonly makeKey: () => string = randomKey) {}

  /** The key for this action: the pending one if its last try had no definite answer, else a fresh one. */
  keyFor(action: string): string {
    let key = this.keys.get(action);
    if (!key) {
      key = this.makeKey();
      this.keys.set(action, key);
    }
    return key;
  }

  /** After an answer: success or a 4xx is final; a network error or 5xx keeps the key for the retry. */
  settle(action: string, error?: unknown): void {
    const final = error === undefined || (isApiError(error) && error.status >= 400 && error.status < 500);
    if (final) this.keys.delete(action);
  }
}

/**
 * A random key. `crypto.randomUUID` exists only on secure pages (https or localhost);
 * a phone trying the demo over plain http on the local network still needs keys.
 */
export function randomKey(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  return Array.from(crypto.getRandomValues(new Uint8Array(16)), (b) => b.toString(16).padStart(2, '0')).join('');
}
