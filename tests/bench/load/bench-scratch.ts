import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { prepareLocalDatabase } from '@server/ops/local-database';
import { stopCluster, type Cluster } from '@server/ops/postgres-cluster';
import { onShutdownSignal } from '@server/ops/shutdown';
import type { AppProcess } from './app-process';

/**
 * A bench script's throwaway set-up: a temporary folder for a PostgreSQL cluster, and the app server processes the
 * script starts (pushed onto `apps`). `cleanUp` stops them all and removes the folder, also on Ctrl-C or SIGTERM.
 */
export function benchScratch(prefix: string) {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  chmodSync(dir, 0o755); // the postgres user must be able to enter it
  const apps: AppProcess[] = [];
  let cluster: Cluster | null = null;
  const cleanUp = async () => {
    await Promise.all(apps.map((a) => a.stop()));
    if (cluster) stopCluster(cluster);
    rmSync(dir, { recursive: true, force: true });
  };
  onShutdownSignal(cleanUp);
  return {
    apps,
    cleanUp,
    /** The cluster, started and migrated with `database` in it (on `port`, else a random one); `throwaway` trades durability for speed. */
    async database(database: string, opts: { port?: number; throwaway?: boolean } = {}) {
      const port = opts.port ?? 56000 + Math.floor(Math.random() * 3000);
      const prepared = await prepareLocalDatabase({ dataRoot: dir, port, database, throwaway: opts.throwaway });
      cluster = prepared.cluster;
      return prepared;
    },
  };
}
