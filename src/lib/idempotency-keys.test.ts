import { describe, expect, it } from 'vitest';
import { ApiError } from './api-error';
import { IdempotencyKeys, randomKey } from './idempotency-keys';

const counter = () => {
  let n = 0;
  return () => `key-${++n}`;
};

describe('IdempotencyKeys', () => {
  it('keeps the key for a retry after a network failure or a 5xx', () => {
    const keys = new IdempotencyKeys(counter());
    const first = keys.keyFor('option-a');
    keys.settle('option-a', new ApiError(0, 'NETWORK', 'offline'));
    expect(keys.keyFor('option-a')).toBe(first);
    keys.settle('option-a', new ApiError(503, 'DB_UNAVAILABLE', 'down'));
    expect(keys.keyFor('option-a')).toBe(first);
  });

  it('gives a fresh key after a success or a definite refusal', () => {
    const keys = new IdempotencyKeys(counter());
    const first = keys.keyFor('option-a');
    keys.settle('option-a');
    const second = keys.keyFor('option-a');
    expect(second).not.toBe(first);
    keys.settle('option-a', new ApiError(409, 'CONFLICT', 'taken'));
    expect(keys.keyFor('option-a')).not.toBe(second);
  });

  it('keeps actions apart', () => {
    const keys = new IdempotencyKeys(counter());
    expect(keys.keyFor('a')).not.toBe(keys.keyFor('b'));
  });
});

describe('randomKey', () => {
  it('makes distinct keys long enough for the API, with or without crypto.randomUUID', () => {
    const original = crypto.randomUUID;
    try {
      expect(randomKey()).not.toBe(randomKey());
      Object.defineProperty(crypto, 'randomUUID', { value: undefined, configurable: true });
      const key = randomKey();
      expect(key).toMatch(/^[0-9a-f]{32}$/);
      expect(key).not.toBe(randomKey());
    } finally {
      Object.defineProperty(crypto, 'randomUUID', { value: original, configurable: true });
    }
  });
});
