import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon } from '../factories/salon';

let t: TestApp;
const good = { name: 'Robin Ash', email: 'robin.ash@example.test', phone: '+1 970 555 0199', password: 'copper-kettle-meadow-7' };

beforeAll(async () => {
  t = await startTestApp();
  await insertSalon(t.testDb.db);
});
afterAll(() => t.close());

describe('POST /api/sign-up', () => {
  it('creates a client account and its client record, and signs the client in', async () => {
    const c = await anonymousAgent(t.app);
    const res = await c.write('post', '/api/sign-up', good);
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ email: good.email, role: 'client', name: 'Robin Ash' });
    const client = await t.testDb.db.selectFrom('clients').selectAll().where('user_id', '=', res.body.user.id).executeTakeFirstOrThrow();
    expect(client.phone).toBe('+19705550199');
    const user = await t.testDb.db.selectFrom('users').select('password_hash').where('id', '=', res.body.user.id).executeTakeFirstOrThrow();
    expect(user.password_hash).toMatch(/^\$argon2id\$/);
    expect((await c.get('/api/session')).body.user.email).toBe(good.email);
  });

  it('when the e-mail is taken (any case), answers 409 EMAIL_TAKEN', async () => {
    const c = await anonymousAgent(t.app);
    const res = await c.write('post', '/api/sign-up', { ...good, email: 'ROBIN.ASH@example.test' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('EMAIL_TAKEN');
  });

  it('refuses a password from the common-password list with a message on the password field', async () => {
    const c = await anonymousAgent(t.app);
    // "qwertyuiop" is in the zxcvbn-ts common-password list (from breach corpora).
    const res = await c.write('post', '/api/sign-up', { ...good, email: 'other@example.test', password: 'qwertyuiop' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.password).toMatch(/common/);
    expect(await t.testDb.db.selectFrom('users').select('id').where('email', '=', 'other@example.test').execute()).toHaveLength(0);
  });

  it('answers per-field messages for a short password, a bad e-mail and an unknown field, and stores nothing', async () => {
    const c = await anonymousAgent(t.app);
    const res = await c.write('post', '/api/sign-up', { ...good, email: 'not-an-email', password: 'short', isAdmin: true });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'isAdmin', 'password']);
  });
});
