import { readFileSync } from 'node:fs';
import request from 'supertest';
import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '@server/app';
import { loadConfig } from '@server/config';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { documentedRoutes, fillPath } from './access-matrix/openapi-routes';

let t: TestApp;
let owner: UserFixture;

const IDLE_MINUTES = 30;
const ABSOLUTE_HOURS = 2;

beforeAll(async () => {
  t = await startTestApp({ SESSION_IDLE_MINUTES: String(IDLE_MINUTES), SESSION_ABSOLUTE_HOURS: String(ABSOLUTE_HOURS) });
  const salon = await insertSalon(t.testDb.db);
  owner = await insertUser(t.testDb.db, salon.salonId, 'owner');
});
afterAll(() => t.close());

const cookies = (res: { headers: Record<string, unknown> }) => ([] as string[]).concat((res.headers['set-cookie'] as string[] | undefined) ?? []);
const sessionCookie = (res: { headers: Record<string, unknown> }) => cookies(res).find((c) => c.startsWith('dwell.sid='));

/** The session rows that belong to a user (connect-pg-simple keeps passport's user id in the JSON). */
const sessionsOf = (userId: string) =>
  t.testDb.db
    .selectFrom('session')
    .select(['sid', 'expire'])
    .where(sql<string>`sess->'passport'->>'user'`, '=', userId)
    .execute();

describe('session lifetime', () => {
  it('sets the idle timeout from SESSION_IDLE_MINUTES on the cookie and in the store', async () => {
    const c = await signedInAgent(t.app, owner.email, owner.password);
    const res = await c.get('/api/session');
    const expires = Date.parse(/Expires=([^;]+)/.exec(sessionCookie(res) ?? '')![1]!);
    const rows = await sessionsOf(owner.id);
    for (const left of [expires - Date.now(), Math.max(...rows.map((r) => r.expire.getTime())) - Date.now()]) {
      expect(left).toBeGreaterThan((IDLE_MINUTES - 1) * 60_000);
      expect(left).toBeLessThanOrEqual(IDLE_MINUTES * 60_000 + 1000);
    }
  });

  it('ends a session idle past its expiry', async () => {
    const c = await signedInAgent(t.app, owner.email, owner.password);
    const before = new Set((await sessionsOf(owner.id)).map((s) => s.sid));
    // Rewind every session of this user as if IDLE_MINUTES had passed without a request.
    await t.testDb.db
      .updateTable('session')
      .set({ expire: new Date(Date.now() - 1000) })
      .where('sid', 'in', [...before])
      .execute();
    const res = await c.get('/api/session');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('UNAUTHENTICATED');
  });

  it('ends an active session ABSOLUTE_HOURS after sign-in, however recent its last request', async () => {
    const c = await signedInAgent(t.app, owner.email, owner.password);
    expect((await c.get('/api/session')).status).toBe(200);
    const startedAt = Date.now() - (ABSOLUTE_HOURS * 3_600_000 + 60_000);
    await sql`update session set sess = jsonb_set(sess::jsonb, '{startedAt}', to_jsonb(${startedAt}::bigint))::json
              where sess->'passport'->>'user' = ${owner.id}`.execute(t.testDb.db);
    const res = await c.get('/api/session');
    expect(res.status).toBe(401);
    expect(res.body.error.message).toMatch(/session ended/);
    expect((await c.get('/api/session')).status).toBe(401);
  });

  it('sign-out ends the session in the store: replaying the old cookie is refused', async () => {
    const c = await signedInAgent(t.app, owner.email, owner.password);
    const old = sessionCookie(await c.get('/api/session'))!.split(';')[0]!;
    expect((await c.write('delete', '/api/session')).status).toBe(204);
    const replay = await request(t.app).get('/api/session').set('Cookie', old);
    expect(replay.status).toBe(401);
  });
});

describe('cookies', () => {
  it('are HttpOnly and SameSite=Lax, without Secure in local development (plain http)', async () => {
    const c = await anonymousAgent(t.app);
    const res = await c.write('post', '/api/session', { email: owner.email, password: owner.password });
    for (const cookie of cookies(res)) {
      expect(cookie).toMatch(/HttpOnly/);
      expect(cookie).toMatch(/SameSite=Lax/);
      expect(cookie).not.toMatch(/Secure/);
    }
  });

  it('carry Secure (and the CSRF cookie the __Host- prefix) in production', async () => {
    // Behind its TLS-terminating proxy on loopback, which production believes only when TRUST_PROXY names it.
    const prod = loadConfig({ DATABASE_URL: t.testDb.url, DWELL_MODE: 'production', SESSION_SECRET: 'x'.repeat(40), TRUST_PROXY: 'loopback' });
    expect(prod.secureCookies).toBe(true);
    const app = createApp({ db: t.testDb.db, pool: t.testDb.pool, jobs: t.jobs, ...t.outside, config: { ...prod, useFakes: true, uploadsDir: t.uploadsDir } });
    // Behind the trusted proxy the request counts as https. The test's
    // http client rightly keeps Secure cookies to itself, so they are passed on by hand.
    const csrf = await request(app).get('/api/csrf').set('X-Forwarded-Proto', 'https');
    const signIn = await request(app)
      .post('/api/session')
      .set('X-Forwarded-Proto', 'https')
      .set(
        'Cookie',
        cookies(csrf)
          .map((c) => c.split(';')[0])
          .join('; '),
      )
      .set('X-CSRF-Token', csrf.body.token)
      .send({ email: owner.email, password: owner.password });
    expect(signIn.status).toBe(200);
    const all = [...cookies(csrf), ...cookies(signIn)];
    expect(all.some((c) => c.startsWith('__Host-dwell.csrf='))).toBe(true);
    expect(all.some((c) => c.startsWith('dwell.sid='))).toBe(true);
    for (const cookie of all) expect(cookie).toMatch(/; Secure/);
    expect(signIn.headers['strict-transport-security']).toBe('max-age=31536000; includeSubDomains');
  });
});

describe('CSRF', () => {
  it('refuses every cookie-authenticated write in the OpenAPI document without a token, signed in or not (403 CSRF)', async () => {
    const { routes } = await documentedRoutes(t.app);
    // Provider webhooks carry no session cookie: they are authenticated by the provider's signature instead
    // (tested in messages-inbound tests), so a CSRF token means nothing there.
    const writes = routes.filter((r) => r.method !== 'get' && !r.path.startsWith('/webhooks/'));
    expect(writes.length).toBeGreaterThan(20);
    const signedIn = await signedInAgent(t.app, owner.email, owner.password);
    const anonymous = await anonymousAgent(t.app);
    const failures: string[] = [];
    for (const route of writes) {
      for (const who of [signedIn, anonymous]) {
        const res = await who.agent[route.method](fillPath(route.path)).send({});
        if (res.status !== 403 || res.body.error?.code !== 'CSRF') failures.push(`${route.key} → ${res.status} ${res.body.error?.code}`);
      }
    }
    expect(failures).toEqual([]);
  }, 120_000);

  it("refuses another session's token", async () => {
    const mine = await signedInAgent(t.app, owner.email, owner.password);
    const theirs = await anonymousAgent(t.app);
    const token = (await theirs.get('/api/csrf')).body.token;
    const res = await mine.agent.delete('/api/session').set('X-CSRF-Token', token);
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('CSRF');
  });
});

describe('Content-Security-Policy', () => {
  it('allows scripts from the app itself only: no inline script, no eval, no plugins, no framing by others', async () => {
    const res = await (await anonymousAgent(t.app)).get('/api/health');
    const csp = Object.fromEntries(
      String(res.headers['content-security-policy'])
        .split(';')
        .map((d) => d.trim().split(/\s+/))
        .map(([name, ...values]) => [name, values]),
    );
    expect(csp['default-src']).toEqual(["'self'"]);
    expect(csp['script-src']).toEqual(["'self'"]);
    expect(csp['script-src-attr']).toEqual(["'none'"]);
    expect(csp['object-src']).toEqual(["'none'"]);
    expect(csp['base-uri']).toEqual(["'self'"]);
    expect(csp['frame-ancestors']).toEqual(["'self'"]);
    // The client bundles its fonts: none from other sites, none inlined.
    expect(csp['font-src']).toEqual(["'self'"]);
  });

  it('index.html loads its script from a file, never inline (the build copies this tag)', () => {
    const html = readFileSync('index.html', 'utf8');
    const scripts = [...html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/gi)];
    expect(scripts.length).toBeGreaterThan(0);
    for (const [, attrs, body] of scripts) {
      expect(attrs).toMatch(/\bsrc=/);
      expect(body!.trim()).toBe('');
    }
    expect(html).not.toMatch(/\son[a-z]+=/i); // no inline event handlers either
  });
});
