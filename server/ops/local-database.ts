// The set-up `npm start`, `npm run dev` and `npm test` share: a running local cluster and a migrated database.
import { join } from 'node:path';
import { createDb, createPool } from '../db/database';
import { migrateToLatest } from '../db/migrate';
import { isDatabaseEmpty, loadDemoSalon } from '../demo/load-demo-salon';
import { clusterPaths, databaseUrl, ensureCluster, ensureDatabase, findPostgresBin, startCluster, type Cluster } from './postgres-cluster';

export interface LocalDatabaseOptions {
  /** Folder that holds the cluster (e.g. `<repo>/.data`). */
  dataRoot: string;
  port: number;
  database: string;
  /** Throwaway clusters only: trades durability for speed. */
  throwaway?: boolean;
}

export async function prepareLocalDatabase(opts: LocalDatabaseOptions): Promise<{ cluster: Cluster; url: string }> {
  const binDir = findPostgresBin();
  const { dataDir, socketDir } = clusterPaths(opts.dataRoot);
  const cluster: Cluster = { binDir, dataDir, socketDir, port: opts.port, logFile: join(dataDir, 'server.log') };
  const created = ensureCluster(cluster);
  if (created) console.log(`dwell: created a PostgreSQL cluster in ${dataDir}`);
  const fast = opts.throwaway ? ['-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off'] : [];
  startCluster(cluster, fast);
  await ensureDatabase(cluster, opts.database);
  const url = databaseUrl(cluster, opts.database);
  const db = createDb(createPool(url));
  try {
    await migrateToLatest(db);
  } finally {
    await db.destroy();
  }
  return { cluster, url };
}

/** The demo salon goes into an empty database only: a restart keeps whatever the user changed. */
export async function loadDemoIfEmpty(url: string): Promise<void> {
  const db = createDb(createPool(url));
  try {
    if (await isDatabaseEmpty(db)) {
      const { bookings } = await loadDemoSalon(db, new Date());
      console.log(`dwell: loaded the demo salon (${bookings} bookings)`);
    }
  } finally {
    await db.destroy();
  }
}
