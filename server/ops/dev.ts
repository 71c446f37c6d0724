// `npm run dev`: the same database set-up as `npm start`, the API with fakes, and Vite's dev server with
// hot reload, which forwards /api to the API (see vite.config.ts).
import { spawn } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { loadConfig } from '../config';
import { startServer } from '../main';
import { loadDemoIfEmpty, prepareLocalDatabase } from './local-database';
import { stopCluster } from './postgres-cluster';
import { takeRunLock } from './run-lock';
import { onShutdownSignal } from './shutdown';
import { localSessionSecret } from './session-secret';

const root = process.cwd();
const dataRoot = join(root, '.data');
const port = Number(process.env.PORT ?? 3000);

mkdirSync(dataRoot, { recursive: true });
const lock = takeRunLock(join(dataRoot, 'dwell.pid'));
if ('heldBy' in lock) {
  console.error(`dwell: already running in this folder (process ${lock.heldBy}).`);
  process.exit(1);
}
const { cluster, url } = await prepareLocalDatabase({ dataRoot, port: Number(process.env.PGPORT ?? 54329), database: 'dwell' });
await loadDemoIfEmpty(url);
const server = await startServer(
  loadConfig({
    ...process.env,
    DATABASE_URL: url,
    PORT: String(port),
    DWELL_MODE: 'dev',
    SESSION_SECRET: localSessionSecret(join(dataRoot, 'session-secret')),
  }),
);
console.log(`dwell: API on ${server.url}; the app with hot reload on http://127.0.0.1:5173`);
const vite = spawn(join(root, 'node_modules', '.bin', 'vite'), [], { cwd: root, stdio: 'inherit', env: { ...process.env, PORT: String(port) } });

onShutdownSignal(async () => {
  vite.kill('SIGTERM');
  await server.close();
  stopCluster(cluster);
  lock.release();
});
