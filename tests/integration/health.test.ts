import { createServer, connect, type Server } from 'node:net';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '@server/app';
import { loadConfig } from '@server/config';
import { createDb, createPool } from '@server/db/database';
import { startOutsideServices } from '@server/services';
import { createTestDb, type TestDb } from '../setup/test-db';

let t: TestDb;
beforeAll(async () => {
  t = await createTestDb();
});
afterAll(() => t.drop());

/** A TCP relay to PostgreSQL that can be switched off and on, to play a database outage. */
function relayTo(target: URL) {
  let server: Server | null = null;
  const port = 40000 + Math.floor(Math.random() * 10000);
  return {
    port,
    up: () =>
      new Promise<void>((resolve) => {
        server = createServer((sock) => {
          const pg = connect(Number(target.port), target.hostname);
          sock.pipe(pg).pipe(sock);
          sock.on('error', () => pg.destroy());
          pg.on('error', () => sock.destroy());
        });
        server.listen(port, '127.0.0.1', () => resolve());
      }),
    down: () => new Promise<void>((resolve) => (server ? server.close(() => resolve()) : resolve())),
  };
}

describe('GET /api/health', () => {
  it('answers 503 db "down" while PostgreSQL is unreachable, and recovers by itself when it returns', async () => {
    const target = new URL(t.url);
    const relay = relayTo(target);
    const url = t.url.replace(`:${target.port}/`, `:${relay.port}/`);
    const pool = createPool(url);
    const db = createDb(pool);
    const config = loadConfig({ DATABASE_URL: url, DWELL_MODE: 'test' });
    const outside = await startOutsideServices(config);
    // No job queue here: it would need the database this test takes away.
    const jobs = { schedule: async () => {}, stop: async () => {} };
    const app = createApp({ db, pool, config, jobs, ...outside });

    const down = await request(app).get('/api/health');
    expect(down.status).toBe(503);
    expect(down.body).toEqual({ ok: false, db: 'down' });

    await relay.up();
    const up = await request(app).get('/api/health');
    expect(up.status).toBe(200);
    expect(up.body).toEqual({ ok: true, db: 'up' });
    await db.destroy();
    await outside.close();
    await relay.down();
  });
});
