import { hash, verify } from '@node-rs/argon2';
import { dictionary } from '@zxcvbn-ts/language-common';

// argon2id with OWASP's minimum profile (19 MiB, 2 passes, 1 lane) — memory-hard and quick enough to sign in.
// `algorithm: 2` is Argon2id (the package's enum is a const enum, which isolated modules cannot import).
const OPTIONS = { algorithm: 2, memoryCost: 19_456, timeCost: 2, parallelism: 1 };

export const hashPassword = (password: string) => hash(password, OPTIONS);

export async function verifyPassword(stored: string, password: string): Promise<boolean> {
  try {
    return await verify(stored, password);
  } catch {
    return false;
  }
}

// The zxcvbn-ts list of ~49,000 passwords seen most often in breaches.
const common = new Set((dictionary['passwords-common'] as string[]).map((p) => p.toLowerCase()));

/** True for a password found in the common-password list (case-insensitive). */
export const isCommonPassword = (password: string) => common.has(password.toLowerCase());
