import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { waitForMail } from '../setup/mail';
import { insertSalon } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';

let t: TestApp;
let owner: UserFixture;

beforeAll(async () => {
  t = await startTestApp();
  const salon = await insertSalon(t.testDb.db);
  owner = await insertUser(t.testDb.db, salon.salonId, 'owner');
});
afterAll(() => t.close());

describe('password reset', () => {
  it('answers 202 for an unknown address and sends nothing', async () => {
    const c = await anonymousAgent(t.app);
    const res = await c.write('post', '/api/password-reset', { email: 'nobody@example.test' });
    expect(res.status).toBe(202);
    await new Promise((r) => setTimeout(r, 200));
    expect(t.smtp.messages.filter((m) => m.to === 'nobody@example.test')).toHaveLength(0);
  });

  it('e-mails a one-time link that sets a new password, ends old sessions, and cannot be used twice', async () => {
    const oldSession = await signedInAgent(t.app, owner.email, owner.password);
    const c = await anonymousAgent(t.app);
    expect((await c.write('post', '/api/password-reset', { email: owner.email })).status).toBe(202);
    const mail = await waitForMail(t.smtp, owner.email);
    const token = /token=([A-Za-z0-9_-]+)/.exec(mail.text)?.[1];
    expect(token).toBeDefined();
    const stored = await t.testDb.db.selectFrom('password_resets').select('token_hash').execute();
    expect(stored.map((s) => s.token_hash)).not.toContain(token); // only a hash is kept

    const newPassword = 'saffron-harbour-lamp-88';
    expect((await c.write('post', '/api/password-reset/confirm', { token, password: newPassword })).status).toBe(204);
    expect((await oldSession.get('/api/session')).status).toBe(401);
    await signedInAgent(t.app, owner.email, newPassword);

    const again = await c.write('post', '/api/password-reset/confirm', { token, password: 'another-fine-passphrase' });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('RESET_TOKEN_INVALID');
  });

  it('refuses an expired link', async () => {
    const token = 'expired-token-for-the-test-0123456789';
    await t.testDb.db
      .insertInto('password_resets')
      .values({ user_id: owner.id, token_hash: createHash('sha256').update(token).digest('hex'), expires_at: new Date(Date.now() - 1000), used_at: null })
      .execute();
    const c = await anonymousAgent(t.app);
    const res = await c.write('post', '/api/password-reset/confirm', { token, password: 'late-but-long-enough-1' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('RESET_TOKEN_INVALID');
  });
});
