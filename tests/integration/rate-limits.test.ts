import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { anotherApp, anonymousAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon } from '../factories/salon';
import { insertUser } from '../factories/user';

// Limits per network address (the test's requests come from 127.0.0.1, or from the address they forward through
// the trusted loopback proxy): the numbers are the ones the routes declare; these tests fail if a limit disappears
// or grows, or can be raced or escaped.
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

describe('sign-in limits under attack', () => {
  const from = (address: string) => ({ 'X-Forwarded-For': address });

  it('60 concurrent wrong passwords for one account: at most 5 are checked, the rest are 429', async () => {
    const salon = await insertSalon(t.testDb.db);
    const victim = await insertUser(t.testDb.db, salon.salonId, 'owner');
    const callers = await Promise.all(Array.from({ length: 60 }, () => anonymousAgent(t.app)));
    // Each from an address of its own, as a botnet would: the per-address limit does not help here.
    const answers = await Promise.all(
      callers.map((c, i) => c.write('post', '/api/session', { email: victim.email, password: `wrong-guess-${i}` }, from(`10.60.0.${i + 1}`))),
    );
    const checked = await t.testDb.db.selectFrom('sign_in_attempts').select('id').where('email', '=', victim.email.toLowerCase()).execute();
    expect(checked.length).toBeLessThanOrEqual(5);
    expect(answers.filter((a) => a.status === 401)).toHaveLength(checked.length);
    expect(answers.filter((a) => a.status === 429)).toHaveLength(60 - checked.length);
    const refused = answers.find((a) => a.status === 429)!;
    expect(Number(refused.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('the rightful owner still signs in from their own address while strangers guess, and a stranger with the password does not', async () => {
    const salon = await insertSalon(t.testDb.db);
    const owner = await insertUser(t.testDb.db, salon.salonId, 'owner');
    const home = '10.61.0.1';
    expect((await (await anonymousAgent(t.app)).write('post', '/api/session', { email: owner.email, password: owner.password }, from(home))).status).toBe(200);
    const attacker = await anonymousAgent(t.app);
    for (let i = 0; i < 8; i++) await attacker.write('post', '/api/session', { email: owner.email, password: `guess-${i}-wrong` }, from('10.61.9.9'));
    const stolen = await attacker.write('post', '/api/session', { email: owner.email, password: owner.password }, from('10.61.9.9'));
    expect(stolen.status).toBe(429);
    const back = await (await anonymousAgent(t.app)).write('post', '/api/session', { email: owner.email, password: owner.password }, from(home));
    expect(back.status).toBe(200);
  });
});

describe('limits across app servers and proxies', () => {
  it('count in PostgreSQL: two app servers share one allowance per address', async () => {
    const other = anotherApp(t);
    try {
      const [a, b] = [await anonymousAgent(t.app), await anonymousAgent(other)];
      const address = { 'X-Forwarded-For': '10.62.0.1' };
      const reset = (c: typeof a, i: number) => c.write('post', '/api/password-reset', { email: `nobody${i}@example.test` }, address);
      for (let i = 0; i < 10; i++) expect((await reset(i % 2 ? a : b, i)).status).not.toBe(429);
      expect((await reset(a, 10)).status).toBe(429);
      expect((await reset(b, 11)).status).toBe(429);
    } finally {
      await other.shutdown();
    }
  });

  it('ignore X-Forwarded-For from a peer that is not a trusted proxy', async () => {
    const direct = anotherApp(t, { TRUST_PROXY: 'none' });
    // The tests above used up this peer's (127.0.0.1's) allowances: start its counts again.
    await t.testDb.db.deleteFrom('rate_limit_hits').execute();
    try {
      const c = await anonymousAgent(direct);
      // A caller rotating the header must not look like ten different addresses: all ten count as this peer's.
      let i = 0;
      await expectLimit(10, () => c.write('post', '/api/password-reset', { email: 'nobody@example.test' }, { 'X-Forwarded-For': `10.63.0.${++i}` }));
    } finally {
      await direct.shutdown();
    }
  });
});
