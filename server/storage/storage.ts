import { randomUUID } from 'node:crypto';

/** Where uploaded bytes live. Keys are ours (never a user's file name), so a disk or bucket can hold them as-is. */
export interface Storage {
  put(key: string, bytes: Buffer): Promise<void>;
  /** The bytes, or null when nothing is stored under the key. */
  get(key: string): Promise<Buffer | null>;
  /** Removing a key that is not there is not an error: clean-up after a failed batch may repeat. */
  delete(key: string): Promise<void>;
}

// Lower-case segments of letters, digits and dashes, then one known extension: no dots, slashes or
// anything a path could be steered with.
const KEY = /^[a-z0-9-]{1,64}(\/[a-z0-9-]{1,64}){0,3}\.(jpg|png|webp)$/;

export function isValidKey(key: string): boolean {
  return KEY.test(key);
}

/** Throws for a key the storage must never see; every implementation calls it first. */
export function assertValidKey(key: string): void {
  if (!isValidKey(key)) throw new Error(`Invalid storage key: ${JSON.stringify(key)}`);
}

/** A fresh random key under a prefix (a salon id), e.g. `1f0c…/8b2e….jpg`. */
export function newKey(prefix: string, extension: 'jpg' | 'png' | 'webp'): string {
  const key = `${prefix.toLowerCase()}/${randomUUID()}.${extension}`;
  assertValidKey(key);
  return key;
}
