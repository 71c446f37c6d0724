import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';

const sessionCookie = (res: { headers: Record<string, unknown> }) =>
  ([] as string[]).concat((res.headers['set-cookie'] as string[] | undefined) ?? []).find((c) => c.startsWith('dwell.sid='));

let t: TestApp;
let desk: UserFixture;

beforeAll(async () => {
  t = await startTestApp();
  const salon = await insertSalon(t.testDb.db);
  desk = await insertUser(t.testDb.db, salon.salonId, 'front_desk');
});
afterAll(() => t.close());

describe('POST /api/session', () => {
  it('when the password is right, answers the user and a HttpOnly SameSite=Lax session cookie', async () => {
    const c = await anonymousAgent(t.app);
    const res = await c.write('post', '/api/session', { email: desk.email, password: desk.password });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email: desk.email, role: 'front_desk' });
    const cookie = sessionCookie(res);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect((await c.get('/api/session')).body.user.id).toBe(desk.id);
  });

  it('renews the session id on sign-in (no session fixation)', async () => {
    const c = await anonymousAgent(t.app);
    const before = sessionCookie(await c.get('/api/csrf'));
    await c.refreshCsrf();
    const res = await c.write('post', '/api/session', { email: desk.email, password: desk.password });
    const after = sessionCookie(res);
    expect(after).toBeDefined();
    expect(after?.split(';')[0]).not.toBe(before?.split(';')[0]);
  });

  it('when the password is wrong or the account unknown, answers the same 401 message', async () => {
    const c = await anonymousAgent(t.app);
    const wrong = await c.write('post', '/api/session', { email: desk.email, password: 'not-the-password' });
    const unknown = await c.write('post', '/api/session', { email: 'nobody@example.test', password: 'whatever-it-is' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error.code).toBe('INVALID_CREDENTIALS');
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
  });

  it('after 5 failures for one account within 15 minutes, answers 429 even with the right password', async () => {
    const salon = await insertSalon(t.testDb.db);
    const victim = await insertUser(t.testDb.db, salon.salonId, 'owner');
    const c = await anonymousAgent(t.app);
    for (let i = 0; i < 5; i++) {
      expect((await c.write('post', '/api/session', { email: victim.email, password: `guess-${i}-wrong` })).status).toBe(401);
    }
    const res = await c.write('post', '/api/session', { email: victim.email, password: victim.password });
    expect(res.status).toBe(429);
    expect(res.body.error.code).toBe('RATE_LIMITED');
  });

  it('without the CSRF header, refuses the write with 403 CSRF', async () => {
    const c = await anonymousAgent(t.app);
    const res = await c.agent.post('/api/session').send({ email: desk.email, password: desk.password });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('CSRF');
  });
});

describe('DELETE /api/session', () => {
  it('signs out: the session no longer answers', async () => {
    const c = await signedInAgent(t.app, desk.email, desk.password);
    expect((await c.write('delete', '/api/session')).status).toBe(204);
    const res = await c.get('/api/session');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('UNAUTHENTICATED');
  });
});
