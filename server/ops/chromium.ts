import { existsSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { SetupError } from './postgres-cluster';

const CANDIDATES = ['/usr/lib/chromium/chromium', '/usr/bin/chromium'];

/** Debian's Chromium for the browser tests; installed with apt-get when missing and root. */
export function findChromium(): string {
  const found = CANDIDATES.find((p) => existsSync(p));
  if (found) return found;
  if (process.getuid?.() !== 0) {
    throw new SetupError('Chromium was not found. Install it with:  sudo apt-get install -y chromium');
  }
  console.log('dwell: installing Chromium from Debian (apt-get install -y chromium)…');
  for (const args of [
    ['update', '-qq'],
    ['install', '-y', '-qq', 'chromium'],
  ]) {
    const res = spawnSync('apt-get', args, { stdio: 'inherit', env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
    if (res.status !== 0) throw new SetupError(`apt-get ${args.join(' ')} failed`);
  }
  const installed = CANDIDATES.find((p) => existsSync(p));
  if (!installed) throw new SetupError('apt-get installed chromium but no browser binary was found');
  return installed;
}
