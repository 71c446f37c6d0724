import request from 'supertest';
import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { onLogLine } from '@server/lib/logger';
import { sendDueMessages } from '@server/features/messages/send-message.job';
import { anotherApp, anonymousAgent, signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';

// Logs are JSON lines (pino); each request's line carries the id it answered in X-Request-Id and in any error
// body, and nothing that would let a reader of the logs act as someone: no passwords, cookies, session ids,
// tokens or message texts.
let t: TestApp;
let owner: UserFixture;
let client: UserFixture;
let lines: Record<string, unknown>[] = [];
let stop: () => void;

beforeAll(async () => {
  t = await startTestApp({ LOG_LEVEL: 'debug' });
  const salon = await insertSalon(t.testDb.db);
  owner = await insertUser(t.testDb.db, salon.salonId, 'owner');
  client = await insertUser(t.testDb.db, salon.salonId, 'client');
  stop = onLogLine((line) => lines.push(JSON.parse(line)));
});
afterAll(async () => {
  stop();
  await t.close();
});

const requestLine = (id: string | undefined) => lines.find((l) => (l.req as { id?: string } | undefined)?.id === id);

describe('request ids', () => {
  it('answer every request with X-Request-Id, put it in every error body and in the request log line', async () => {
    const c = await anonymousAgent(t.app);
    const ok = await c.get('/api/health');
    expect(ok.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    const refused = await c.get('/api/desk/day');
    expect(refused.status).toBe(401);
    expect(refused.body.error.requestId).toBe(refused.headers['x-request-id']);
    const unknown = await c.get('/api/no-such-route');
    expect(unknown.body.error.requestId).toBe(unknown.headers['x-request-id']);
    expect(requestLine(refused.headers['x-request-id'])).toMatchObject({ level: 30, res: { statusCode: 401 }, req: { method: 'GET', url: '/api/desk/day' } });
  });

  it('keep the id a trusted proxy passes on, and make a new one when anyone else sends it', async () => {
    const c = await anonymousAgent(t.app); // the test app trusts its loopback proxy (TRUST_PROXY's default outside production)
    expect((await c.agent.get('/api/health').set('X-Request-Id', 'lb-7f3a-0001')).headers['x-request-id']).toBe('lb-7f3a-0001');
    // Not an id at all: a new one is made.
    expect((await c.agent.get('/api/health').set('X-Request-Id', 'not an id {"level":60}')).headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    const direct = anotherApp(t, { TRUST_PROXY: 'none', LOG_LEVEL: 'debug' });
    try {
      const res = await request(direct).get('/api/health').set('X-Request-Id', 'forged-0001');
      expect(res.headers['x-request-id']).not.toBe('forged-0001');
    } finally {
      await direct.shutdown();
    }
  });
});

describe('what the logs leave out', () => {
  it('no password, cookie, session id, CSRF token, secret link or message text in any line, while each keeps its ids', async () => {
    lines = [];
    const wrong = 'Wrong-Password-Canary-91';
    const c = await anonymousAgent(t.app);
    const failed = await c.write('post', '/api/session', { email: owner.email, password: wrong });
    expect(failed.status).toBe(401);
    const signed = await signedInAgent(t.app, owner.email, owner.password);
    const cookie = String((await signed.get('/api/session')).headers['set-cookie'] ?? '');
    await signed.get('/api/offers/secret-offer-token-canary');
    await (await anonymousAgent(t.app)).get('/reset-password?token=reset-token-canary');
    // A message goes out: its line names the message, not the address or the text.
    const text = 'Message-Body-Canary: your appointment is tomorrow';
    const { id: messageId } = await t.testDb.db
      .insertInto('messages')
      .values({
        salon_id: (await t.testDb.db.selectFrom('salons').select('id').executeTakeFirstOrThrow()).id,
        client_id: client.clientId!,
        kind: 'reminder_24h',
        channel: 'sms',
        to_address: '+17205550999',
        subject: '',
        body: text,
        send_at: new Date(Date.now() - 1000),
        dedupe_key: 'log-test-1',
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    await sendDueMessages(t.testDb.db, t.outside, new Date());
    // A background job's run (they run every minute and at start) carries the job's name and id.
    for (let i = 0; i < 100 && !lines.some((l) => l.jobId); i++) await new Promise((r) => setTimeout(r, 100));

    const all = lines.map((l) => JSON.stringify(l)).join('\n');
    for (const secret of [wrong, owner.password, 'secret-offer-token-canary', 'reset-token-canary', 'Message-Body-Canary', '+17205550999']) {
      expect(all).not.toContain(secret);
    }
    const sid = /dwell\.sid=([^;]+)/.exec(cookie)?.[1];
    if (sid) expect(all).not.toContain(decodeURIComponent(sid).slice(2, 30));
    expect(lines.find((l) => l.msg === 'message sent')).toMatchObject({ messageId, channel: 'sms' });
    expect(lines.find((l) => l.jobId)).toMatchObject({ job: expect.any(String), jobId: expect.any(String) });
    expect(lines.find((l) => (l.req as { url?: string } | undefined)?.url?.startsWith('/api/offers/'))).toMatchObject({
      req: { url: '/api/offers/[redacted]' },
    });
    expect(requestLine(failed.headers['x-request-id'])).toMatchObject({ res: { statusCode: 401 } });
  });

  it('an unexpected error is logged once, at error level, with its stack and the request id the client was given', async () => {
    lines = [];
    // A failure nothing maps to an answer: the database refuses new clients with an error of its own.
    await sql`create function refuse_clients() returns trigger language plpgsql as $$ begin raise exception 'Unexpected-Failure-Canary'; end $$;
              create trigger refuse_clients before insert on clients execute function refuse_clients();`.execute(t.testDb.db);
    try {
      const owner$ = await signedInAgent(t.app, owner.email, owner.password);
      const res = await owner$.write('post', '/api/clients', { name: 'Never Stored' });
      expect(res.status).toBe(500);
      expect(res.body.error).toEqual({ code: 'INTERNAL', message: 'Something went wrong on our side.', requestId: res.headers['x-request-id'] });
      const logged = lines.filter((l) => JSON.stringify(l).includes('Unexpected-Failure-Canary'));
      expect(logged).toHaveLength(1);
      expect(logged[0]).toMatchObject({
        level: 50,
        req: { id: res.headers['x-request-id'] },
        res: { statusCode: 500 },
        err: { stack: expect.stringContaining('Unexpected-Failure-Canary') },
      });
    } finally {
      await sql`drop trigger refuse_clients on clients; drop function refuse_clients();`.execute(t.testDb.db);
    }
  });
});
