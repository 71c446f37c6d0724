import { afterAll, beforeAll, expect, it } from 'vitest';
import { createTestDb, type TestDb } from '../setup/test-db';
import { loadDemoSalon } from '@server/demo/load-demo-salon';

let testDb: TestDb;
beforeAll(async () => {
  testDb = await createTestDb();
});
afterAll(() => testDb.drop());

it('the demo salon’s Outbox has its messages: the past sent at their due time, the rest queued for the worker', async () => {
  const now = new Date();
  await loadDemoSalon(testDb.db, now);
  const rows = await testDb.db.selectFrom('messages').selectAll().execute();
  const sent = rows.filter((r) => r.status === 'sent');
  const queued = rows.filter((r) => r.status === 'queued');
  expect(sent.length).toBeGreaterThan(20);
  expect(queued.length).toBeGreaterThan(10);
  expect(sent.every((r) => r.sent_at!.getTime() === r.send_at.getTime() && r.send_at <= now)).toBe(true);
  expect(queued.every((r) => r.send_at > now)).toBe(true);
  const kinds = new Set(rows.map((r) => r.kind));
  for (const kind of ['confirmation', 'reminder_48h', 'reminder_24h', 'aftercare', 'cancellation']) expect(kinds, kind).toContain(kind);
  // Clients who chose e-mail only got no texts.
  const emailOnly = await testDb.db.selectFrom('clients').select('id').where('message_channel', '=', 'email').execute();
  expect(emailOnly.length).toBeGreaterThan(0);
  expect(rows.some((r) => r.channel === 'sms' && emailOnly.some((c) => c.id === r.client_id))).toBe(false);
});
