import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';

/** A per-checkout session secret kept in .data/, so signed-in sessions survive a restart. */
export function localSessionSecret(path: string): string {
  if (existsSync(path)) return readFileSync(path, 'utf8').trim();
  const secret = randomBytes(32).toString('hex');
  writeFileSync(path, secret, { mode: 0o600 });
  return secret;
}
