import { existsSync, readFileSync, rmSync, writeFileSync } from 'node:fs';

/** One `npm start` per checkout: a second one reports the first instead of sharing its cluster. */
export function takeRunLock(path: string): { release(): void } | { heldBy: number } {
  if (existsSync(path)) {
    const pid = Number(readFileSync(path, 'utf8'));
    if (pid && isAlive(pid)) return { heldBy: pid };
  }
  writeFileSync(path, String(process.pid));
  return { release: () => rmSync(path, { force: true }) };
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === 'EPERM';
  }
}
