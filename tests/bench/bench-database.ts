import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { prepareLocalDatabase } from '@server/ops/local-database';
import { stopCluster, type Cluster } from '@server/ops/postgres-cluster';

/**
 * A migrated database for a bench: DATABASE_URL when it is set, else a throwaway PostgreSQL cluster (no fsync) in a
 * scratch folder on a random port, stopped and removed once `use` is done.
 */
export async function withBenchDatabase<T>(use: (url: string) => Promise<T>): Promise<T> {
  let cluster: Cluster | null = null;
  const scratch = mkdtempSync(join(tmpdir(), 'dwell-bench-'));
  chmodSync(scratch, 0o755); // the postgres user must be able to enter it
  try {
    let url = process.env.DATABASE_URL;
    if (!url) {
      const prepared = await prepareLocalDatabase({
        dataRoot: scratch,
        port: 59000 + Math.floor(Math.random() * 900),
        database: 'dwell_bench',
        throwaway: true,
      });
      cluster = prepared.cluster;
      url = prepared.url;
    }
    return await use(url);
  } finally {
    if (cluster) stopCluster(cluster);
    rmSync(scratch, { recursive: true, force: true });
  }
}
