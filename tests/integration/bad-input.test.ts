import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';

let t: TestApp;
let desk: UserFixture;

beforeAll(async () => {
  t = await startTestApp();
  const salon = await insertSalon(t.testDb.db);
  desk = await insertUser(t.testDb.db, salon.salonId, 'front_desk');
});
afterAll(() => t.close());

describe('bad input answers a clear 4xx JSON error and stores nothing', () => {
  it('malformed JSON → 400 BAD_JSON', async () => {
    const c = await anonymousAgent(t.app);
    const res = await c.write('post', '/api/sign-up').set('content-type', 'application/json').send('{"name": "Ro');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('BAD_JSON');
  });

  it('wrong types → 400 with a message per field', async () => {
    const c = await anonymousAgent(t.app);
    const res = await c.write('post', '/api/session', { email: 42, password: ['x'] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password']);
  });

  it('a body over 100 kB → 413 PAYLOAD_TOO_LARGE', async () => {
    const c = await anonymousAgent(t.app);
    const res = await c.write('post', '/api/sign-up', { name: 'x'.repeat(120_000) });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('PAYLOAD_TOO_LARGE');
  });

  it('SQL-looking search text is just text', async () => {
    const c = await signedInAgent(t.app, desk.email, desk.password);
    const res = await c.get(`/api/clients?q=${encodeURIComponent("x' or 1=1; drop table clients; --")}`);
    expect(res.status).toBe(200);
    expect(res.body.clients).toEqual([]);
    expect(await t.testDb.db.selectFrom('clients').select('id').execute()).toBeDefined();
  });

  it('an unknown query parameter and a bad date → 400 naming the field', async () => {
    const c = await signedInAgent(t.app, desk.email, desk.password);
    const unknown = await c.get('/api/desk/day?date=2027-03-02&debug=1');
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.fields.debug).toBeDefined();
    const bad = await c.get('/api/desk/day?date=2027-02-30');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.date).toBeDefined();
  });

  it('unknown API routes → JSON 404, never the client app', async () => {
    const res = await (await anonymousAgent(t.app)).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('NOT_FOUND');
  });

  it('a malformed id → 400, not a database error', async () => {
    const c = await signedInAgent(t.app, desk.email, desk.password);
    const res = await c.get('/api/clients/not-a-uuid');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.id).toBeDefined();
  });

  it('never answers a stack trace', async () => {
    const c = await anonymousAgent(t.app);
    const res = await c.write('post', '/api/session').set('content-type', 'application/json').send('[[[');
    expect(JSON.stringify(res.body)).not.toMatch(/at \w+ \(|node_modules/);
  });
});
