// Plain Node on purpose: this runs before any package is installed.
// It installs packages when they are missing or stale, then hands over to the TypeScript command.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const commands = { start: 'start.ts', test: 'test-run.ts', dev: 'dev.ts' };
const command = process.argv[2];
if (!commands[command]) {
  console.error(`usage: bootstrap.mjs ${Object.keys(commands).join('|')}`);
  process.exit(2);
}

const [major, minor] = process.versions.node.split('.').map(Number);
if (major < 20 || (major === 20 && minor < 19)) {
  console.error(`Dwell needs Node.js 20.19 or newer; this is ${process.versions.node}.`);
  process.exit(1);
}

function packagesAreStale() {
  const marker = join(root, 'node_modules', '.package-lock.json');
  if (!existsSync(marker)) return true;
  return statSync(join(root, 'package-lock.json')).mtimeMs > statSync(marker).mtimeMs;
}

if (packagesAreStale()) {
  console.log('dwell: installing packages (npm ci)…');
  const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';
  const res = spawnSync(npm, ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (res.status !== 0) process.exit(res.status ?? 1);
}

// tsx as a loader in this same child (not its CLI wrapper), so signals reach our handler exactly as sent.
const child = spawn(process.execPath, ['--import', 'tsx', join(root, 'server', 'ops', commands[command]), ...process.argv.slice(3)], {
  cwd: root,
  stdio: 'inherit',
});
// Ctrl-C reaches the child through the terminal's process group; a plain `kill` of this
// process is passed on so the child can stop PostgreSQL cleanly.
process.on('SIGINT', () => {});
process.on('SIGTERM', () => child.kill('SIGTERM'));
// `kill <npm's pid>` ends npm and its shell without passing the signal on; when this process is orphaned
// that way, stop the child just as if the signal had arrived.
const parent = process.ppid;
setInterval(() => {
  if (process.ppid !== parent) child.kill('SIGTERM');
}, 500).unref();
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
