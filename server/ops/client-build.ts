import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

const INPUTS = ['src', 'shared', 'index.html', 'vite.config.ts', 'tailwind.config.ts', 'package-lock.json'];

function newestMtime(path: string): number {
  if (!existsSync(path)) return 0;
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  return Math.max(stat.mtimeMs, ...readdirSync(path).map((name) => newestMtime(join(path, name))));
}

/** Builds the client with Vite unless dist/ is newer than every input (so a second start takes seconds). */
export function buildClientIfStale(root: string): void {
  const built = join(root, 'dist', 'client', 'index.html');
  const builtAt = existsSync(built) ? statSync(built).mtimeMs : 0;
  if (builtAt > Math.max(...INPUTS.map((p) => newestMtime(join(root, p))))) return;
  console.log('dwell: building the client…');
  const res = spawnSync(join(root, 'node_modules', '.bin', 'vite'), ['build', '--logLevel', 'warn'], { cwd: root, stdio: 'inherit' });
  if (res.status !== 0) throw new Error('the client build failed');
}
