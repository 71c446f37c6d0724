import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';

export interface AppProcess {
  url: string;
  child: ChildProcess;
  /** SIGTERM and wait; `kill` sends SIGKILL instead (a crash). */
  stop(signal?: NodeJS.Signals): Promise<void>;
}

/** Starts tests/bench/load/app-server-main.ts in a child process and waits until it listens. */
export function startAppProcess(env: Record<string, string>): Promise<AppProcess> {
  // DWELL_LOAD_PROFILE=<folder>: each app server writes a V8 CPU profile there when it stops (open in Chrome's DevTools).
  const profile = process.env.DWELL_LOAD_PROFILE ? ['--cpu-prof', `--cpu-prof-dir=${process.env.DWELL_LOAD_PROFILE}`] : [];
  const child = spawn(process.execPath, [...profile, '--import', 'tsx', join(import.meta.dirname, 'app-server-main.ts')], {
    env: { ...process.env, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let errors = '';
  child.stderr!.on('data', (d) => (errors = (errors + d).slice(-4000)));
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`app server did not start in 60 s:\n${errors}`)), 60_000);
    child.once('exit', (code) => reject(new Error(`app server exited (${code}) before listening:\n${errors}`)));
    child.stdout!.on('data', (d: Buffer) => {
      const m = /LISTENING (\S+)/.exec(d.toString());
      if (!m) return;
      clearTimeout(timer);
      resolve({
        url: m[1]!,
        child,
        async stop(signal = 'SIGTERM') {
          if (child.exitCode === null && child.signalCode === null) child.kill(signal);
          await exited;
        },
      });
    });
  });
}
