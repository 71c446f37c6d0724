// A project-local PostgreSQL cluster from Debian's packages: found or installed, created, started, stopped.
// initdb and postgres refuse to run as root, so as root every server command runs as the `postgres` user.
import { execFileSync, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { chownSync, existsSync, mkdirSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import pg from 'pg';

export interface Cluster {
  binDir: string;
  dataDir: string;
  socketDir: string;
  port: number;
  logFile: string;
}

const isRoot = process.getuid?.() === 0;
const SUPERUSER = 'dwell';

export class SetupError extends Error {}

/** The newest `/usr/lib/postgresql/<v>/bin`; installs Debian's `postgresql` package when missing and root. */
export function findPostgresBin(): string {
  const found = newestBin();
  if (found) return found;
  if (!isRoot) {
    throw new SetupError(
      'PostgreSQL server binaries were not found under /usr/lib/postgresql/*/bin.\n' +
        'Install them with:  sudo apt-get install -y postgresql   (then run this command again)',
    );
  }
  console.log('dwell: installing PostgreSQL from Debian (apt-get install -y postgresql)…');
  run('apt-get', ['update', '-qq']);
  run('apt-get', ['install', '-y', '-qq', 'postgresql'], { DEBIAN_FRONTEND: 'noninteractive' });
  const installed = newestBin();
  if (!installed) throw new SetupError('apt-get installed postgresql but no server binaries were found.');
  return installed;
}

function newestBin(): string | null {
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return null;
  const versions = readdirSync(base)
    .filter((v) => existsSync(join(base, v, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  const [newest] = versions;
  return newest ? join(base, newest, 'bin') : null;
}

/**
 * Where the cluster lives. The postgres user must be able to enter every parent folder and socket paths are
 * limited to 107 bytes, so a checkout under a private home (or a very deep path) falls back to /tmp.
 */
export function clusterPaths(preferredRoot: string): { dataDir: string; socketDir: string } {
  const wanted = { dataDir: join(preferredRoot, 'pg'), socketDir: join(preferredRoot, 'run') };
  if (wanted.socketDir.length < 80 && postgresCanEnter(preferredRoot)) return wanted;
  const key = createHash('sha1').update(preferredRoot).digest('hex').slice(0, 10);
  const fallback = `/tmp/dwell-${key}`;
  return { dataDir: join(fallback, 'pg'), socketDir: join(fallback, 'run') };
}

function postgresCanEnter(dir: string): boolean {
  mkdirSync(dir, { recursive: true });
  if (!isRoot) return true;
  return spawnSync('runuser', ['-u', 'postgres', '--', 'test', '-x', dir]).status === 0;
}

/** Creates the cluster when its folder is empty; trust auth is safe because it listens on 127.0.0.1 only. */
export function ensureCluster(cluster: Cluster): boolean {
  for (const dir of [cluster.dataDir, cluster.socketDir]) {
    mkdirSync(dir, { recursive: true, mode: 0o700 });
    if (isRoot) chownToPostgres(dir);
  }
  if (existsSync(join(cluster.dataDir, 'PG_VERSION'))) return false;
  asServerUser(join(cluster.binDir, 'initdb'), ['-D', cluster.dataDir, '-U', SUPERUSER, '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8', '--no-instructions']);
  return true;
}

export function isRunning(cluster: Cluster): boolean {
  return spawnSync(...serverUserCommand(join(cluster.binDir, 'pg_ctl'), ['status', '-D', cluster.dataDir])).status === 0;
}

export function startCluster(cluster: Cluster, extraSettings: string[] = []): void {
  if (isRunning(cluster)) return;
  const settings = ['-c listen_addresses=127.0.0.1', `-p ${cluster.port}`, `-k ${cluster.socketDir}`, ...extraSettings];
  const res = spawnSync(
    ...serverUserCommand(join(cluster.binDir, 'pg_ctl'), ['start', '-w', '-t', '60', '-D', cluster.dataDir, '-l', cluster.logFile, '-o', settings.join(' ')]),
    { encoding: 'utf8' },
  );
  if (res.status !== 0) {
    throw new SetupError(`PostgreSQL did not start on 127.0.0.1:${cluster.port} (is the port taken?). See ${cluster.logFile}.\n${res.stderr ?? ''}`);
  }
}

export function stopCluster(cluster: Cluster): void {
  if (!isRunning(cluster)) return;
  spawnSync(...serverUserCommand(join(cluster.binDir, 'pg_ctl'), ['stop', '-m', 'fast', '-w', '-D', cluster.dataDir]), {
    stdio: 'ignore',
  });
}

export function databaseUrl(cluster: Cluster, database: string): string {
  return `postgres://${SUPERUSER}@127.0.0.1:${cluster.port}/${database}`;
}

/** CREATE DATABASE unless it exists (optionally copied from a template). Returns true when created. */
export async function ensureDatabase(cluster: Cluster, name: string, template?: string): Promise<boolean> {
  const client = new pg.Client({ connectionString: databaseUrl(cluster, 'postgres') });
  await client.connect();
  try {
    const found = await client.query('select 1 from pg_database where datname = $1', [name]);
    if (found.rowCount) return false;
    const from = template ? ` template "${template}"` : '';
    await client.query(`create database "${name}"${from}`);
    return true;
  } finally {
    await client.end();
  }
}

function chownToPostgres(dir: string): void {
  const uid = Number(execFileSync('id', ['-u', 'postgres']).toString().trim());
  const gid = Number(execFileSync('id', ['-g', 'postgres']).toString().trim());
  chownSync(dir, uid, gid);
}

function serverUserCommand(cmd: string, args: string[]): [string, string[]] {
  return isRoot ? ['runuser', ['-u', 'postgres', '--', cmd, ...args]] : [cmd, args];
}

function asServerUser(cmd: string, args: string[]): void {
  const res = spawnSync(...serverUserCommand(cmd, args), { encoding: 'utf8' });
  if (res.status !== 0) throw new SetupError(`${cmd} failed:\n${res.stderr}`);
}

function run(cmd: string, args: string[], env: Record<string, string> = {}): void {
  const res = spawnSync(cmd, args, { stdio: 'inherit', env: { ...process.env, ...env } });
  if (res.status !== 0) throw new SetupError(`${cmd} ${args.join(' ')} failed`);
}
