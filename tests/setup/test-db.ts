import { randomBytes } from 'node:crypto';
import pg from 'pg';
import type { Kysely } from 'kysely';
import { createDb, createPool } from '@server/db/database';
import type { Database } from '@server/db/schema';
import { testEnv } from './test-env';

export interface TestDb {
  db: Kysely<Database>;
  pool: pg.Pool;
  url: string;
  drop(): Promise<void>;
}

/**
 * A fresh database per test file, copied from the migrated template (fast, and files can run in parallel).
 * PostgreSQL refuses two copies of one template at the same instant, so a busy template is retried.
 */
export async function createTestDb(): Promise<TestDb> {
  const { templateUrl, adminUrl } = testEnv();
  const name = `t_${randomBytes(6).toString('hex')}`;
  const template = new URL(templateUrl).pathname.slice(1);
  const admin = new pg.Client({ connectionString: adminUrl });
  await admin.connect();
  try {
    for (let attempt = 0; ; attempt++) {
      try {
        await admin.query(`create database "${name}" template "${template}"`);
        break;
      } catch (err) {
        if (attempt > 40 || !/being accessed by other users/.test((err as Error).message)) throw err;
        await new Promise((r) => setTimeout(r, 100 + Math.random() * 200));
      }
    }
  } finally {
    await admin.end();
  }
  const url = adminUrl.replace(/\/postgres$/, `/${name}`);
  const pool = createPool(url);
  const db = createDb(pool);
  return {
    db,
    pool,
    url,
    async drop() {
      await db.destroy();
      const c = new pg.Client({ connectionString: adminUrl });
      await c.connect();
      await c.query(`drop database if exists "${name}" with (force)`);
      await c.end();
    },
  };
}
