import { chromium, type BrowserServer } from 'playwright-core';
import type { TestProject } from 'vitest/node';
import { loadConfig } from '@server/config';
import { startServer } from '@server/main';
import { loadDemoSalon } from '@server/demo/load-demo-salon';
import { createTestDb } from './test-db';
import { testEnv } from './test-env';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    wsEndpoint: string;
    /** The app's throwaway database, for a test that must place a booking at the real "now" (tests/e2e/day-of-service.test.ts). */
    databaseUrl: string;
  }
}

/** One app on a throwaway copy of the demo salon and one shared Chromium for every browser test. */
export default async function setup(project: TestProject) {
  const env = testEnv();
  const testDb = await createTestDb();
  await loadDemoSalon(testDb.db, new Date());
  const server = await startServer(loadConfig({ DATABASE_URL: testDb.url, DWELL_MODE: 'test', PORT: '0' }));
  const browser: BrowserServer = await chromium.launchServer({
    executablePath: env.chromium,
    headless: true,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-dev-shm-usage',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  });
  project.provide('baseUrl', server.url);
  project.provide('wsEndpoint', browser.wsEndpoint());
  project.provide('databaseUrl', testDb.url);
  return async () => {
    await browser.close();
    await server.close();
    await testDb.drop();
  };
}
