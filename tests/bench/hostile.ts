// `npm run hostile`: what an attacker's requests get from a running app server. A throwaway cluster with the demo
// salon and one app server in its own process (as in production; loopback is its trusted proxy, as a load balancer
// would be), then:
//  1. the races: concurrent sign-in guesses, unique writes ten at a time, one idempotency key with two requests,
//     one hold claimed by five clients and paid from ten tabs, one checkout's card part taken in cash from five
//     tabs; and forged X-Forwarded-For at a server that trusts no proxy (a second process);
//  2. every route of its OpenAPI document walked with the worst value for each field (tests/integration/fuzz/),
//     as owner, front desk, stylist, client and signed out, every case for every caller a route lets in (after the
//     races, since the walk's writes change the demo's records).
// Prints the figures (docs/reliability.md); exits non-zero on any 5xx or a race with more than one winner.
import { randomUUID } from 'node:crypto';
import { createDb, createPool } from '@server/db/database';
import { loadDemoSalon } from '@server/demo/load-demo-salon';
import { DEMO_PASSWORD } from '@server/demo/demo-catalogue';
import { startAppProcess } from './load/app-process';
import { benchScratch } from './load/bench-scratch';
import { anonymousSession, signIn } from './load/http-session';
import { runWalk } from '../integration/fuzz/walk-runner';
import { walkIds } from '../integration/fuzz/walk-ids';
import type { DocumentedRoute, Method, OpenApiOperation } from '../integration/access-matrix/openapi-routes';
import { runRaces } from './hostile/races';

async function documented(url: string): Promise<DocumentedRoute[]> {
  const document = (await (await fetch(`${url}/api/openapi.json`)).json()) as { paths: Record<string, Record<string, OpenApiOperation>> };
  return Object.entries(document.paths).flatMap(([path, ops]) =>
    Object.entries(ops).map(([method, operation]) => ({ method: method as Method, path, key: `${method.toUpperCase()} ${path}`, operation })),
  );
}

async function main(): Promise<number> {
  const { apps, cleanUp, database } = benchScratch('dwell-hostile-');
  try {
    const prepared = await database('dwell_hostile', { port: process.env.PGPORT ? Number(process.env.PGPORT) : undefined, throwaway: true });
    const db = createDb(createPool(prepared.url));
    await loadDemoSalon(db, new Date());
    const ids = await walkIds(db);
    const env = { DATABASE_URL: prepared.url, PORT: process.env.PORT ?? '3107', SESSION_SECRET: randomUUID() + randomUUID() };
    const app = await startAppProcess(env);
    apps.push(app);
    const untrusted = await startAppProcess({ ...env, PORT: String(Number(env.PORT) + 1), TRUST_PROXY: 'none' });
    apps.push(untrusted);

    console.log('1. Races');
    const races = await runRaces(app.url, untrusted.url, db, ids);
    for (const r of races) console.log(`   ${r.name}: ${JSON.stringify(r.answers)} — ${r.figure}`);
    console.log('\n2. Every documented route, worst value per field, as each role');
    const started = Date.now();
    const routes = await documented(app.url);
    const as = async (name: string, email: string) => ({ name, session: await signIn(app.url, email, DEMO_PASSWORD) });
    const callers = [
      await as('owner', 'owner@demo.test'),
      await as('front desk', 'desk@demo.test'),
      await as('stylist', 'ana@demo.test'),
      await as('client', 'client@demo.test'),
      { name: 'signed out', session: await anonymousSession(app.url) },
    ];
    let address = 0;
    const walk = await runWalk({
      baseUrl: app.url,
      routes,
      callers,
      anonymous: () => anonymousSession(app.url),
      ids,
      headers: () => ({ 'x-forwarded-for': `10.${(address >> 16) & 255}.${(address >> 8) & 255}.${address++ & 255}` }),
    });
    const fiveHundreds = [...walk.statuses].filter(([s]) => s >= 500).reduce((n, [, c]) => n + c, 0);
    const seconds = (Date.now() - started) / 1000;
    console.log(`   ${walk.requests} requests over ${routes.length} routes in ${seconds.toFixed(0)} s (${Math.round(walk.requests / seconds)}/s)`);
    console.log(`   answers by status: ${JSON.stringify(Object.fromEntries([...walk.statuses].sort(([a], [b]) => a - b)))}`);
    console.log(`   5xx: ${fiveHundreds}; other broken answers: ${walk.failures.length - fiveHundreds}`);
    for (const f of walk.failures.slice(0, 20)) console.log(`   ✗ ${f}`);

    await db.destroy();

    const broken = [...walk.failures.map(() => 'a walk answer'), ...races.flatMap((r) => r.broken)];
    const summary = `${walk.requests} hostile requests, ${fiveHundreds} × 5xx; ${races.length} races, ${races.filter((r) => r.broken.length).length} broken`;
    console.log(`\ndwell hostile: ${broken.length ? 'FAIL' : 'PASS'} — ${summary}`);
    for (const b of races.flatMap((r) => r.broken)) console.log(`   ✗ ${b}`);
    return broken.length ? 1 : 0;
  } catch (err) {
    console.error(`dwell hostile: failed — ${(err as Error).stack ?? err}`);
    return 1;
  } finally {
    await cleanUp();
  }
}

process.exitCode = await main();
