import { afterAll, beforeAll, expect, it } from 'vitest';
import { spawn, type ChildProcess } from 'node:child_process';
import { createTestDb, type TestDb } from '../setup/test-db';
import { insertSalon } from '../factories/salon';
import { insertUser } from '../factories/user';
import { startSmsFake, type SmsFake } from '@server/fakes/sms-fake';

/**
 * A real app server process (server/ops/serve.ts, the production entry) is killed with SIGKILL after it has
 * claimed a message and while its request to the SMS service is still unanswered; a second process started
 * afterwards must send that message exactly once. The SMS fake runs here, outside both processes, so what
 * it received survives the kill and can be counted.
 */
let testDb: TestDb;
let sms: SmsFake;
const children: ChildProcess[] = [];

beforeAll(async () => {
  testDb = await createTestDb();
  sms = await startSmsFake();
});
afterAll(async () => {
  for (const c of children) if (c.exitCode === null && c.signalCode === null) c.kill('SIGKILL');
  await sms.close();
  await testDb.drop();
});

function startApp(): ChildProcess {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/ops/serve.ts'], {
    env: { ...process.env, DATABASE_URL: testDb.url, PORT: '0', DWELL_MODE: 'test', SMS_API_URL: sms.url, MESSAGE_CLAIM_TIMEOUT_SECONDS: '2' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  children.push(child);
  child.stderr!.on('data', (d) => process.stderr.write(`[app ${child.pid}] ${d}`));
  return child;
}

async function until<T>(what: string, check: () => Promise<T | undefined | false> | T | undefined | false, seconds = 90): Promise<T> {
  const end = Date.now() + seconds * 1000;
  for (;;) {
    const value = await check();
    if (value) return value;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

it('a server killed between claim and send: after a restart the message is sent exactly once', { timeout: 240_000 }, async () => {
  const db = testDb.db;
  const salon = await insertSalon(db);
  const client = await insertUser(db, salon.salonId, 'client');
  const phone = '+17205550777';
  await db.updateTable('clients').set({ phone }).where('id', '=', client.clientId!).execute();
  const { id } = await db
    .insertInto('messages')
    .values({
      salon_id: salon.salonId,
      client_id: client.clientId!,
      kind: 'reminder_24h',
      channel: 'sms',
      to_address: phone,
      body: 'Crash test reminder',
      send_at: new Date(),
      dedupe_key: `crash:${Date.now()}`,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  const row = () => db.selectFrom('messages').select(['status', 'attempts', 'provider_ref']).where('id', '=', id).executeTakeFirstOrThrow();

  sms.stallNext(1); // the provider holds the first request open: claimed, not yet accepted by anyone
  const first = startApp();
  await until('the first server to claim the message and call the SMS service', () => sms.stalled() === 1);
  expect(await row()).toMatchObject({ status: 'sending', attempts: 1, provider_ref: null });
  const exited = new Promise((resolve) => first.once('exit', (_code, signal) => resolve(signal)));
  first.kill('SIGKILL');
  expect(await exited).toBe('SIGKILL');
  await until('the held request to close', () => sms.stalled() === 0);
  expect(sms.messages.filter((m) => m.to === phone)).toHaveLength(0);

  const second = startApp();
  const sent = await until('the restarted server to send it', async () => ((await row()).status === 'sent' ? row() : undefined));
  expect(sent).toMatchObject({ status: 'sent', attempts: 2 });
  // Give any leftover job of the dead process (pg-boss re-runs expired ones) a moment: still one text.
  await new Promise((r) => setTimeout(r, 3000));
  const received = sms.messages.filter((m) => m.to === phone);
  console.log(`crash-restart: messages received by the SMS fake for the killed send = ${received.length}`);
  expect(received).toHaveLength(1);
  expect(received[0]!.body).toBe('Crash test reminder');
  second.kill('SIGTERM');
  await new Promise((resolve) => second.once('exit', resolve));
});
