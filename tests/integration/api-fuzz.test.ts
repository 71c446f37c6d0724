import type { AddressInfo } from 'node:net';
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { loadDemoSalon } from '@server/demo/load-demo-salon';
import { DEMO_PASSWORD, demoSalon } from '@server/demo/demo-catalogue';
import { documentedRoutes, type DocumentedRoute } from './access-matrix/openapi-routes';
import { requestArbitrary, type FuzzRequest } from './fuzz/request-arbitrary';
import { answersEventStream, headOfStream } from '../setup/event-stream';
import { anonymousSession, signIn } from '../bench/load/http-session';
import { answerProblem, runWalk } from './fuzz/walk-runner';
import { walkIds } from './fuzz/walk-ids';
import { messagesApi } from '@shared/api/messages.api';
import { FAKE_TWILIO } from '@server/services';

// Property-based fuzzing of every route in the OpenAPI document, as the demo salon's owner and signed out:
// requests drawn from each route's own schemas plus hostile mutations (see fuzz/request-arbitrary.ts).
// The properties: never a 5xx, and every refusal in the one error shape { error: { code, message, requestId } }.
// Runs per route and caller are bounded so `npm test` stays quick; DWELL_FUZZ_RUNS=200 digs deeper.
const RUNS = Number(process.env.DWELL_FUZZ_RUNS ?? 5);

// Routes that change who the owner's session belongs to (signing in, up or out) are fuzzed signed out only.
const SESSION_CHANGING = new Set(['POST /api/session', 'DELETE /api/session', 'POST /api/sign-up']);

let t: TestApp;
let routes: DocumentedRoute[];
let owner: Awaited<ReturnType<typeof signedInAgent>>;
let ids: string[];
let baseUrl: string;
let server: ReturnType<TestApp['app']['listen']>;

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  await loadDemoSalon(db, new Date());
  const pick = async (table: 'bookings' | 'clients' | 'services' | 'staff' | 'chairs' | 'basins' | 'standby_entries' | 'skin_tests') =>
    (await db.selectFrom(table).select('id').limit(4).execute()).map((r) => r.id);
  ids = (await Promise.all((['bookings', 'clients', 'services', 'staff', 'chairs', 'basins', 'standby_entries', 'skin_tests'] as const).map(pick))).flat();
  owner = await signedInAgent(t.app, 'owner@demo.test', DEMO_PASSWORD);
  routes = (await documentedRoutes(t.app)).routes;
  server = t.app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  // As startServer does: the SMS fake delivers simulated inbound texts to this app's webhook.
  t.sms.setInboundWebhook(`${baseUrl}${messagesApi.inboundSms.path}`, FAKE_TWILIO.authToken);
});
afterAll(async () => {
  server?.closeAllConnections();
  await new Promise((resolve) => server?.close(resolve));
  await t.close();
});

type Caller = Awaited<ReturnType<typeof anonymousAgent>>;

function send(caller: Caller, route: DocumentedRoute, req: FuzzRequest) {
  // A live event stream stays open: it is read up to its opening.
  if (route.method === 'get') {
    const test = caller.agent.get(req.path).query(req.query);
    return answersEventStream(route.operation) ? headOfStream(test) : test;
  }
  return caller
    .write(route.method, req.path)
    .query(req.query)
    .set('Content-Type', 'application/json')
    .send(req.body === undefined ? '' : JSON.stringify(req.body));
}

describe('fuzzing every documented route', () => {
  it('never answers 5xx, and refuses in the standard error shape', async () => {
    const failures: string[] = [];
    let requests = 0;
    const statuses = new Map<number, number>();
    for (const route of routes) {
      const anonymous = await anonymousAgent(t.app);
      const callers: [string, Caller][] = [['signed out', anonymous]];
      if (!SESSION_CHANGING.has(route.key)) callers.push(['owner', owner]);
      for (const [name, caller] of callers) {
        const arbitrary = requestArbitrary(route, { ids, slug: demoSalon.slug });
        try {
          await fc.assert(
            fc.asyncProperty(arbitrary, async (req) => {
              requests++;
              const res = await send(caller, route, req);
              statuses.set(res.status, (statuses.get(res.status) ?? 0) + 1);
              const found = answerProblem(res);
              if (found) throw new Error(found);
            }),
            { numRuns: RUNS, endOnFailure: true },
          );
        } catch (err) {
          failures.push(`${route.key} as ${name}: ${(err as Error).message.split('\n').slice(0, 6).join(' | ')}`);
        }
        // GET /api/csrf replaces the token a caller holds.
        await caller.refreshCsrf();
      }
    }
    console.log(`fuzz: ${requests} requests; answers by status ${JSON.stringify(Object.fromEntries(statuses))}`);
    expect(failures).toEqual([]);
    expect(requests).toBeGreaterThanOrEqual(routes.length * RUNS);
    // Not only refusals: some drawn requests must get through validation and be served.
    const served = [...statuses].filter(([s]) => s < 300).reduce((n, [, c]) => n + c, 0);
    expect(served).toBeGreaterThan(routes.length / 2);
  }, 240_000);
});

describe('walking every documented route with the worst value for each field', () => {
  it('answers no 5xx to any of them, as each role and signed out', async () => {
    const started = Date.now();
    const as = async (name: string, email: string) => ({ name, session: await signIn(baseUrl, email, DEMO_PASSWORD) });
    // The owner first: the first caller a route lets in meets every case, the others a spread of them.
    const callers = [
      await as('owner', 'owner@demo.test'),
      await as('front desk', 'desk@demo.test'),
      await as('stylist', 'ana@demo.test'),
      await as('client', 'client@demo.test'),
      { name: 'signed out', session: await anonymousSession(baseUrl) },
    ];
    let address = 0;
    const report = await runWalk({
      baseUrl,
      routes,
      callers,
      anonymous: () => anonymousSession(baseUrl),
      ids: await walkIds(t.testDb.db),
      // The app trusts its loopback proxy here: a new forwarded address per request keeps per-address limits out of the way.
      headers: () => ({ 'x-forwarded-for': `10.18.${(address >> 8) & 255}.${address++ & 255}` }),
      sampleAfterFirst: 10,
    });
    console.log(
      `route walk: ${report.requests} requests in ${Math.round((Date.now() - started) / 1000)} s; by status ${JSON.stringify(Object.fromEntries(report.statuses))}`,
    );
    expect(report.failures).toEqual([]);
    expect(report.requests).toBeGreaterThan(routes.length * 20);
  }, 240_000);
});
