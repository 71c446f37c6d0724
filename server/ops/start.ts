// `npm start`: the local PostgreSQL cluster, migrations, the demo salon, the client build, and the app.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { loadConfig } from '../config';
import { startServer } from '../main';
import { printWelcome } from './welcome';
import { prepareLocalDatabase, loadDemoIfEmpty } from './local-database';
import { stopCluster, SetupError } from './postgres-cluster';
import { buildClientIfStale } from './client-build';
import { takeRunLock } from './run-lock';
import { onShutdownSignal } from './shutdown';
import { assertPortFree } from './port-check';
import { localSessionSecret } from './session-secret';

const root = process.cwd();
const dataRoot = join(root, '.data');
const port = Number(process.env.PORT ?? 3000);
const pgPort = Number(process.env.PGPORT ?? 54329);

async function main() {
  mkdirSync(dataRoot, { recursive: true });
  const lock = takeRunLock(join(dataRoot, 'dwell.pid'));
  if ('heldBy' in lock) {
    console.error(`dwell: already running in this folder (process ${lock.heldBy}). Stop it first (Ctrl-C in its terminal).`);
    process.exit(1);
  }
  let stopDatabase = () => {};
  try {
    await assertPortFree(port);
    const { cluster, url } = await prepareLocalDatabase({ dataRoot, port: pgPort, database: 'dwell' });
    stopDatabase = () => stopCluster(cluster);
    await loadDemoIfEmpty(url);
    buildClientIfStale(root);
    const config = loadConfig({
      ...process.env,
      DATABASE_URL: url,
      PORT: String(port),
      DWELL_MODE: 'demo',
      SESSION_SECRET: localSessionSecret(join(dataRoot, 'session-secret')),
    });
    const server = await startServer(config);
    printWelcome(server.url, server.outside.paymentsFake?.url.port);
    onShutdownSignal(async () => {
      console.log('\ndwell: stopping…');
      await server.close();
      stopDatabase();
      lock.release();
      console.log('dwell: stopped.');
    });
  } catch (err) {
    console.error(`dwell: ${err instanceof SetupError || err instanceof Error ? err.message : String(err)}`);
    stopDatabase();
    lock.release();
    process.exit(1);
  }
}

await main();
