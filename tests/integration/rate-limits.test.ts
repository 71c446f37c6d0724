import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anonymousAgent, startTestApp, type TestApp } from '../setup/test-app';

// Limits per network address (the test's requests all come from 127.0.0.1): the numbers are the ones the
// routes declare; these tests fail if a limit disappears or grows.
let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

/** Sends `allowed` requests that are let through (whatever their answer), then one more that must be 429. */
async function expectLimit(allowed: number, send: () => Promise<{ status: number; body: { error?: { code: string } } }>) {
  for (let i = 0; i < allowed; i++) {
    const res = await send();
    expect(res.status, `request ${i + 1} of ${allowed}`).not.toBe(429);
  }
  const over = await send();
  expect(over.status).toBe(429);
  expect(over.body.error?.code).toBe('RATE_LIMITED');
}

describe('rate limits', () => {
  it('sign-in: 20 failures from one address within 15 minutes, whatever the accounts, then 429', async () => {
    const c = await anonymousAgent(t.app);
    let n = 0;
    await expectLimit(20, () => c.write('post', '/api/session', { email: `nobody${n++}@example.test`, password: 'wrong-password-here' }));
  });

  it('sign-up: 20 per address per 15 minutes', async () => {
    const c = await anonymousAgent(t.app);
    await expectLimit(20, () => c.write('post', '/api/sign-up', {}));
  });

  it('password reset requests: 10 per address per 15 minutes', async () => {
    const c = await anonymousAgent(t.app);
    await expectLimit(10, () => c.write('post', '/api/password-reset', { email: 'nobody@example.test' }));
  });

  it('public free times: 60 per address per minute', async () => {
    const c = await anonymousAgent(t.app);
    await expectLimit(60, () => c.get('/api/public/salons/no-such-salon/availability'));
  });

  it('public holds (online booking): 20 per address per minute', async () => {
    const c = await anonymousAgent(t.app);
    await expectLimit(20, () => c.write('post', '/api/public/holds', {}));
  });
});
