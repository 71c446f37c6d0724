import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { createApp } from '@server/app';
import { loadConfig } from '@server/config';
import { startOutsideServices, type OutsideServices } from '@server/services';
import { startJobQueue, type JobQueue } from '@server/jobs/job-queue';
import { appJobs } from '@server/jobs/app-jobs';
import type { PaymentsFake } from '@server/fakes/payments-fake';
import type { SmtpFake } from '@server/fakes/smtp-fake';
import type { SmsFake } from '@server/fakes/sms-fake';
import { createTestDb, type TestDb } from './test-db';

export interface TestApp {
  app: ReturnType<typeof createApp>;
  testDb: TestDb;
  smtp: SmtpFake;
  sms: SmsFake;
  payments: PaymentsFake;
  jobs: JobQueue;
  outside: OutsideServices;
  /** This app's own folder for uploaded photos, removed on close. */
  uploadsDir: string;
  close(): Promise<void>;
}

/**
 * The real app on a fresh database with the local e-mail fake, mounted in-process for supertest.
 * `env` adds settings (e.g. short session timeouts) on top of the test defaults.
 */
export async function startTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const testDb = await createTestDb();
  const uploadsDir = await mkdtemp(path.join(tmpdir(), 'dwell-uploads-'));
  const config = loadConfig({ DATABASE_URL: testDb.url, DWELL_MODE: 'test', UPLOADS_DIR: uploadsDir, ...env });
  const outside = await startOutsideServices(config);
  const jobs = await startJobQueue(testDb.url, appJobs(testDb.db, outside));
  const app = createApp({ db: testDb.db, pool: testDb.pool, config, jobs, ...outside });
  return {
    app,
    testDb,
    smtp: outside.smtpFake!,
    sms: outside.smsFake!,
    payments: outside.paymentsFake!,
    jobs,
    outside,
    uploadsDir,
    async close() {
      await app.shutdown();
      await jobs.stop();
      await outside.close();
      await testDb.drop();
      await rm(uploadsDir, { recursive: true, force: true });
    },
  };
}

/** Another app server on the test app's database and services, as a second process behind a load balancer would be; `env` as for startTestApp. */
export function anotherApp(t: TestApp, env: Record<string, string> = {}) {
  const config = loadConfig({ DATABASE_URL: t.testDb.url, DWELL_MODE: 'test', UPLOADS_DIR: t.uploadsDir, ...env });
  return createApp({ db: t.testDb.db, pool: t.testDb.pool, config, jobs: t.jobs, ...t.outside });
}

export type Agent = ReturnType<typeof request.agent>;

/** A cookie-keeping client with a fresh CSRF token; `write` sends it on every write. */
export async function anonymousAgent(app: TestApp['app']) {
  const agent = request.agent(app);
  let token = (await agent.get('/api/csrf')).body.token as string;
  return {
    agent,
    get: (path: string) => agent.get(path),
    write: (method: 'post' | 'put' | 'patch' | 'delete', path: string, body?: object, headers: Record<string, string> = {}) =>
      agent[method](path).set('X-CSRF-Token', token).set(headers).send(body),
    async refreshCsrf() {
      token = (await agent.get('/api/csrf')).body.token;
    },
  };
}

/** Signs in through the API (as the browser does) and returns an agent ready for writes. */
export async function signedInAgent(app: TestApp['app'], email: string, password: string) {
  const client = await anonymousAgent(app);
  const res = await client.write('post', '/api/session', { email, password });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  await client.refreshCsrf(); // the session was renewed on sign-in, and the token is bound to it
  return client;
}
