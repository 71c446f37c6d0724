// One app server for the load and fault scripts, in its own process (as in production): settings come
// from the environment the parent passes; prints LISTENING <url> once it serves.
import { loadConfig } from '@server/config';
import { startServer } from '@server/main';

const server = await startServer(loadConfig({ ...process.env, DWELL_MODE: 'test' }));
console.log(`LISTENING ${server.url}`);
let stopping = false;
process.on('SIGTERM', () => {
  if (stopping) return;
  stopping = true;
  server.close().finally(() => process.exit(0));
});
