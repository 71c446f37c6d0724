/**
 * `npm run bench:utilisation`: three months of the busy salon (the engine bench's generator, ~60 bookings a
 * day, 12 stylists, 14 chairs) loaded into a throwaway PostgreSQL cluster, then the owner's utilisation API
 * for that whole period called over HTTP (supertest against the real app) again and again.
 * Target: p95 under 300 ms. With DATABASE_URL set, that database is used instead of a new cluster
 * (the busy salon is added to it). Never run by `npm test`; the last line is the figure to report.
 */
import { sql } from 'kysely';
import request from 'supertest';
import { createApp } from '@server/app';
import { loadConfig } from '@server/config';
import { createDb, createPool } from '@server/db/database';
import { startJobQueue } from '@server/jobs/job-queue';
import { startOutsideServices } from '@server/services';
import { withBenchDatabase } from './bench-database';
import { loadBusySalon } from './busy-salon-db';

const TARGET_MS = 300;
const WARM_UP = 5;
const RUNS = Number(process.env.BENCH_RUNS ?? 40);
const FROM = '2027-03-01';

async function main(): Promise<void> {
  await withBenchDatabase(async (url) => {
    const pool = createPool(url);
    const db = createDb(pool);
    const started = performance.now();
    const busy = await loadBusySalon(db, { from: FROM, months: 3, now: new Date('2027-04-15T12:00:00Z') });
    await sql`analyze`.execute(db); // fresh statistics, as autovacuum would give a long-lived database
    console.log(
      `busy salon: ${busy.counts.bookings} bookings (${busy.counts.cancelled} cancelled, ${busy.counts.noShows} no-shows), ${busy.counts.stylists} stylists, ${busy.counts.chairs} chairs, ${busy.from}..${busy.to}, loaded in ${Math.round(performance.now() - started)} ms`,
    );

    const config = loadConfig({ DATABASE_URL: url, DWELL_MODE: 'test' });
    const outside = await startOutsideServices(config);
    const jobs = await startJobQueue(url, []);
    const app = createApp({ db, pool, config, jobs, ...outside });
    const agent = request.agent(app);
    const token = (await agent.get('/api/csrf')).body.token as string;
    const signIn = await agent.post('/api/session').set('X-CSRF-Token', token).send({ email: busy.ownerEmail, password: busy.password });
    if (signIn.status !== 200) throw new Error(`sign-in failed: ${signIn.status}`);

    const path = `/api/owner/utilisation?period=custom&from=${busy.from}&to=2027-05-31`;
    const call = async () => {
      const t = performance.now();
      const res = await agent.get(path);
      if (res.status !== 200) throw new Error(`utilisation answered ${res.status}: ${res.text}`);
      return { ms: performance.now() - t, body: res.body };
    };
    const first = await call();
    console.log(
      `period ${first.body.period.from}..${first.body.period.to} (${first.body.period.days} days, ${first.body.period.scenarios} scenario): chair occupancy ${(first.body.chairOccupancy * 100).toFixed(1)} %, window use ${(first.body.windowUse * 100).toFixed(1)} %, ${first.body.attendance.bookings} bookings`,
    );
    for (let i = 0; i < WARM_UP; i++) await call();
    const samples: number[] = [];
    for (let i = 0; i < RUNS; i++) samples.push((await call()).ms);
    samples.sort((a, b) => a - b);
    const at = (q: number) => samples[Math.min(samples.length - 1, Math.ceil(q * samples.length) - 1)]!;
    const p50 = at(0.5);
    const p95 = at(0.95);
    await jobs.stop();
    await outside.close();
    await db.destroy();
    console.log(
      `bench:utilisation: 3-month period p50 ${p50.toFixed(1)} ms, p95 ${p95.toFixed(1)} ms over ${RUNS} calls ${p95 < TARGET_MS ? 'ok' : `OVER target ${TARGET_MS} ms`}`,
    );
  });
}

await main();
