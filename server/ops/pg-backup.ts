// pg_dump / pg_restore of one database, with the client tools of the same PostgreSQL the cluster runs
// (a dump from a newer pg_dump than the server is fine; an older one may refuse a newer server).
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import pg from 'pg';
import { SetupError } from './postgres-cluster';

function tool(binDir: string, name: 'pg_dump' | 'pg_restore', args: string[]): void {
  const res = spawnSync(join(binDir, name), args, { encoding: 'utf8' });
  if (res.status !== 0) throw new SetupError(`${name} failed:\n${res.stderr || res.error?.message || ''}`);
}

/** A consistent snapshot (pg_dump runs in one repeatable-read transaction) in pg_dump's custom format. */
export function dumpDatabase(binDir: string, url: string, file: string): void {
  tool(binDir, 'pg_dump', ['--format=custom', '--no-owner', '--no-privileges', `--file=${file}`, `--dbname=${url}`]);
}

/**
 * Restores a dump as database `name`: into a scratch database first, renamed over the old one only once
 * pg_restore succeeded, so a broken file never leaves a half-restored database behind.
 */
export async function restoreDatabase(binDir: string, adminUrl: string, name: string, file: string): Promise<void> {
  const scratch = `${name}_restoring`;
  const admin = new pg.Client({ connectionString: adminUrl });
  await admin.connect();
  try {
    await admin.query(`drop database if exists "${scratch}" with (force)`);
    await admin.query(`create database "${scratch}" template template0`);
    try {
      tool(binDir, 'pg_restore', [
        '--no-owner',
        '--no-privileges',
        '--exit-on-error',
        '--single-transaction',
        `--dbname=${withDatabase(adminUrl, scratch)}`,
        file,
      ]);
    } catch (err) {
      await admin.query(`drop database if exists "${scratch}" with (force)`);
      throw err;
    }
    await admin.query(`drop database if exists "${name}" with (force)`);
    await admin.query(`alter database "${scratch}" rename to "${name}"`);
  } finally {
    await admin.end();
  }
}

export function withDatabase(url: string, database: string): string {
  const u = new URL(url);
  u.pathname = `/${database}`;
  return u.toString();
}
