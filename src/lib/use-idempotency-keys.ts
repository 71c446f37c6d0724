import { useState } from 'react';
import { IdempotencyKeys } from './idempotency-keys';

/** The keys of one screen's booking actions, kept across renders. */
export function useIdempotencyKeys(): IdempotencyKeys {
  const [keys] = useState(() => new IdempotencyKeys());
  return keys;
}
