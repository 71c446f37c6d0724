// `npm run backup`: a pg_dump of the project's local database into backups/ (gitignored).
// `npm run restore <file>`: that dump back into the project's cluster, while the app is stopped.
import { existsSync, mkdirSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { clusterPaths, databaseUrl, ensureCluster, findPostgresBin, isRunning, SetupError, startCluster, stopCluster, type Cluster } from './postgres-cluster';
import { dumpDatabase, restoreDatabase } from './pg-backup';
import { takeRunLock } from './run-lock';

const root = process.cwd();
const dataRoot = join(root, '.data');
const DATABASE = 'dwell';

function localCluster(): Cluster {
  const binDir = findPostgresBin();
  const { dataDir, socketDir } = clusterPaths(dataRoot);
  const port = Number(process.env.PGPORT ?? 54329);
  return { binDir, dataDir, socketDir, port, logFile: join(dataDir, 'server.log') };
}

/** Runs `work` with the cluster up; a cluster this command started is stopped again afterwards. */
async function withCluster<T>(cluster: Cluster, work: () => Promise<T> | T): Promise<T> {
  if (!existsSync(join(cluster.dataDir, 'PG_VERSION'))) throw new SetupError(`No local database in ${cluster.dataDir}; run npm start once first.`);
  const wasRunning = isRunning(cluster);
  ensureCluster(cluster);
  startCluster(cluster);
  try {
    return await work();
  } finally {
    if (!wasRunning) stopCluster(cluster);
  }
}

async function backup(): Promise<void> {
  const cluster = localCluster();
  const dir = join(root, 'backups');
  mkdirSync(dir, { recursive: true });
  const file = join(dir, `dwell-${new Date().toISOString().replace(/[:.]/g, '-')}.dump`);
  await withCluster(cluster, () => dumpDatabase(cluster.binDir, databaseUrl(cluster, DATABASE), file));
  console.log(`dwell: backup written to ${file} (${Math.round(statSync(file).size / 1024)} KiB)`);
  console.log('dwell: photos live in .data/uploads; copy that folder alongside the dump.');
}

async function restore(fileArg: string | undefined): Promise<void> {
  if (!fileArg) throw new SetupError('usage: npm run restore <file>   (a file written by npm run backup)');
  const file = resolve(fileArg);
  if (!existsSync(file)) throw new SetupError(`No such file: ${file}`);
  // The app's run lock: restoring under a running app would pull the database out from under it.
  mkdirSync(dataRoot, { recursive: true });
  const lock = takeRunLock(join(dataRoot, 'dwell.pid'));
  if ('heldBy' in lock) throw new SetupError(`The app is running (process ${lock.heldBy}); stop it before restoring.`);
  try {
    const cluster = localCluster();
    await withCluster(cluster, () => restoreDatabase(cluster.binDir, databaseUrl(cluster, 'postgres'), DATABASE, file));
    console.log(`dwell: restored ${file} into database "${DATABASE}"; npm start uses it as it is.`);
  } finally {
    lock.release();
  }
}

const [command, arg] = process.argv.slice(2);
try {
  if (command === 'backup') await backup();
  else if (command === 'restore') await restore(arg);
  else throw new SetupError('usage: backup.ts backup | restore <file>');
} catch (err) {
  console.error(`dwell: ${(err as Error).message}`);
  process.exit(1);
}
