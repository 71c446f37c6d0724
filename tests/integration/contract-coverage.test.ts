import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { openApiPath, type Endpoint } from '@shared/api/endpoint';
import { anonymousAgent, startTestApp, type TestApp } from '../setup/test-app';

// Every route is a contract (DEVELOPERS.md, "One contract per endpoint"): registered through apiRoute or
// uploadRoute from an endpoint object of shared/api/*.api.ts, once, and documented. A route added with
// router.get(...) or app.post(...) by hand has no contract, no access check and no OpenAPI entry; this finds it.

const modules = import.meta.glob<Record<string, unknown>>('../../shared/api/*.api.ts', { eager: true });

const METHODS = new Set(['get', 'post', 'put', 'patch', 'delete']);
const isPlain = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && Object.getPrototypeOf(v) === Object.prototype;
const isEndpoint = (v: unknown): v is Endpoint =>
  isPlain(v) && METHODS.has(v.method as string) && typeof v.path === 'string' && typeof v.summary === 'string' && 'access' in v;

/** The endpoints one contract module exports, named as code reaches them (`bookingsApi.move`). */
function endpointsOf(mod: Record<string, unknown>): Map<Endpoint, string> {
  const found = new Map<Endpoint, string>();
  const walk = (value: unknown, name: string) => {
    if (isEndpoint(value)) found.set(value, name);
    else if (isPlain(value)) for (const [key, inner] of Object.entries(value)) walk(inner, `${name}.${key}`);
  };
  for (const [name, value] of Object.entries(mod)) walk(value, name);
  return found;
}

const key = (method: string, path: string) => `${method} ${path}`;

/**
 * Routes on the app's Express router with a handler for a method and path: the app's own and those of
 * routers it mounts. Middleware (app.use) is not a route.
 */
interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle: { stack?: Layer[] };
  rawPath?: unknown;
  slash?: boolean;
}
function expressRoutes(stack: Layer[], prefix = ''): string[] {
  return stack.flatMap((layer) => {
    if (layer.route) return Object.keys(layer.route.methods).map((m) => key(m, prefix + layer.route!.path));
    if (!layer.handle.stack) return [];
    // A router mounted under a path would need its prefix here; today the one API router is mounted at the root.
    if (!layer.slash && typeof layer.rawPath !== 'string') throw new Error('A router is mounted on a pattern: teach expressRoutes its prefix');
    return expressRoutes(layer.handle.stack, layer.slash ? prefix : prefix + (layer.rawPath as string));
  });
}

/** Routes that are not API routes and so have no contract, each with its reason. */
const NOT_API = new Map([
  // The client's shell for its own page paths (React Router), served only when dist/client is built.
  [key('get', '/{*splat}'), 'single-page app fallback'],
]);

function counts(list: string[]): Map<string, number> {
  const tally = new Map<string, number>();
  for (const item of list) tally.set(item, (tally.get(item) ?? 0) + 1);
  return tally;
}

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

describe('contract coverage', () => {
  const perModule = Object.entries(modules).map(([file, mod]) => [file, endpointsOf(mod)] as const);
  const exported = new Map(perModule.flatMap(([, found]) => [...found]));

  it('finds the contracts: every module in shared/api exports endpoints, each method and path once', () => {
    expect(perModule.length).toBeGreaterThan(15);
    expect(
      perModule.filter(([, found]) => found.size === 0).map(([file]) => file),
      'contract modules without an endpoint',
    ).toEqual([]);
    const twice = [...counts([...exported.keys()].map((e) => key(e.method, e.path)))].filter(([, n]) => n > 1);
    expect(twice).toEqual([]);
  });

  it('registers every route from an exported endpoint object, and every exported endpoint exactly once', () => {
    const records = t.app.apiRoutes;
    const foreign = records.filter((r) => !exported.has(r.endpoint)).map((r) => key(r.method, r.path));
    expect(foreign, 'registered from an object that no shared/api/*.api.ts module exports').toEqual([]);
    const times = counts(records.map((r) => exported.get(r.endpoint) ?? ''));
    const notOnce = [...exported.values()].filter((name) => times.get(name) !== 1).map((name) => `${name}: ${times.get(name) ?? 0}×`);
    expect(notOnce, 'endpoints not registered exactly once').toEqual([]);
  });

  it('serves no Express route that apiRoute or uploadRoute did not register', () => {
    const served = counts(expressRoutes((t.app as unknown as { router: { stack: Layer[] } }).router.stack).filter((r) => !NOT_API.has(r)));
    const registered = counts(t.app.apiRoutes.map((r) => key(r.method, r.path)));
    // Compared as counts: a second handler put on a contract's own path by hand is a stray route too.
    const stray = [...new Set([...served.keys(), ...registered.keys()])]
      .filter((route) => served.get(route) !== registered.get(route))
      .map((route) => `${route}: served ${served.get(route) ?? 0}×, registered ${registered.get(route) ?? 0}×`);
    expect(stray, 'routes on the Express router outside apiRoute/uploadRoute').toEqual([]);
  });

  it('documents every exported endpoint in the OpenAPI document with its method, and nothing else', async () => {
    const doc = (await (await anonymousAgent(t.app)).get('/api/openapi.json')).body as { paths: Record<string, Record<string, unknown>> };
    const documented = Object.entries(doc.paths).flatMap(([path, ops]) => Object.keys(ops).map((m) => key(m, path)));
    const contracts = [...exported.keys()].map((e) => key(e.method, openApiPath(e.path)));
    expect(
      contracts.filter((c) => !documented.includes(c)),
      'contracts missing from the OpenAPI document',
    ).toEqual([]);
    expect(
      documented.filter((d) => !contracts.includes(d)),
      'documented operations without a contract',
    ).toEqual([]);
  });
});
