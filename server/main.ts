import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { loadConfig, type Config } from './config';
import { createDb, createPool } from './db/database';
import { createApp } from './app';
import { configureLogger, logger } from './lib/logger';
import { FAKE_TWILIO, startOutsideServices } from './services';
import { startJobQueue } from './jobs/job-queue';
import { appJobs } from './jobs/app-jobs';
import { messagesApi } from '../shared/api/messages.api';
import { paymentsApi } from '../shared/api/payments.api';

export interface RunningServer {
  outside: Awaited<ReturnType<typeof startOutsideServices>>;
  url: string;
  app: ReturnType<typeof createApp>;
  close(): Promise<void>;
}

/** Starts fakes (outside production), the database pool and the HTTP server; close() undoes all of it. */
export async function startServer(config: Config = loadConfig()): Promise<RunningServer> {
  configureLogger(config);
  const outside = await startOutsideServices(config);
  const pool = createPool(config.databaseUrl);
  const db = createDb(pool);
  const jobs = await startJobQueue(config.databaseUrl, appJobs(db, outside, { claimTimeoutSeconds: config.messageClaimTimeoutSeconds }));
  const app = createApp({ db, pool, config, jobs, ...outside });
  const server = await listen(app, config);
  const { port } = server.address() as AddressInfo;
  const url = `http://${config.host}:${port}`;
  // The SMS fake delivers simulated inbound texts (STOP/START) to this server's webhook, signed as the provider would.
  outside.smsFake?.setInboundWebhook(`${url}${messagesApi.inboundSms.path}`, FAKE_TWILIO.authToken);
  logger.info({ url, mode: config.mode }, 'listening');
  // The payments fake posts its signed events to this server's webhook, as the provider posts to a registered endpoint.
  outside.paymentsFake?.setWebhook(`${url}${paymentsApi.webhook.path}`);
  return {
    url,
    app,
    outside,
    async close() {
      const closed = new Promise<void>((resolve) => server.close(() => resolve()));
      server.closeAllConnections();
      await closed;
      await app.shutdown();
      await jobs.stop();
      await outside.close();
      await db.destroy();
    },
  };
}

function listen(app: ReturnType<typeof createApp>, config: Config): Promise<Server> {
  return new Promise((resolve, reject) => {
    const server = app.listen(config.port, config.host);
    server.once('listening', () => resolve(server));
    server.once('error', (err: NodeJS.ErrnoException) => {
      if (err.code === 'EADDRINUSE') reject(new Error(`Port ${config.port} on ${config.host} is already in use; set PORT to another port.`));
      else reject(err);
    });
  });
}
