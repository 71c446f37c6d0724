import { mkdtemp, rm, stat } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { randomBytes } from 'node:crypto';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDb, createPool } from '@server/db/database';
import { loadDemoSalon } from '@server/demo/load-demo-salon';
import { insertPhotos } from '@server/features/photos/photos.repository';
import { findPostgresBin } from '@server/ops/postgres-cluster';
import { dumpDatabase, restoreDatabase, withDatabase } from '@server/ops/pg-backup';
import { createTestDb, type TestDb } from '../setup/test-db';
import { testEnv } from '../setup/test-env';

let source: TestDb;
let scratch: string;
const restoredName = `restored_${randomBytes(5).toString('hex')}`;

beforeAll(async () => {
  source = await createTestDb();
  scratch = await mkdtemp(join(tmpdir(), 'dwell-backup-'));
  await loadDemoSalon(source.db, new Date());
  // Upload references: one photo row per client of the first few bookings.
  const booked = await source.db.selectFrom('bookings').select(['id', 'salon_id', 'client_id']).where('client_id', 'is not', null).limit(5).execute();
  await insertPhotos(
    source.db,
    booked.map((b, i) => ({
      salonId: b.salon_id,
      clientId: b.client_id!,
      bookingId: b.id,
      kind: 'hair_now' as const,
      key: `k/${i}.jpg`,
      mime: 'image/jpeg',
      bytes: 100 + i,
      width: 64,
      height: 48,
    })),
  );
});
afterAll(async () => {
  await source.drop();
  const admin = new pg.Client({ connectionString: testEnv().adminUrl });
  await admin.connect();
  await admin.query(`drop database if exists "${restoredName}" with (force)`);
  await admin.end();
  await rm(scratch, { recursive: true, force: true });
});

async function snapshot(url: string) {
  const db = createDb(createPool(url));
  try {
    const ids = async (table: 'bookings' | 'clients' | 'booking_steps') => (await db.selectFrom(table).select('id').orderBy('id').execute()).map((r) => r.id);
    const photos = await db.selectFrom('client_photos').select(['id', 'client_id', 'booking_id', 'storage_key']).orderBy('id').execute();
    const constraints = await db
      .selectFrom('pg_constraint' as never)
      .select('conname' as never)
      .where('contype' as never, '=', 'x' as never)
      .orderBy('conname' as never)
      .execute();
    return { bookings: await ids('bookings'), clients: await ids('clients'), steps: await ids('booking_steps'), photos, constraints };
  } finally {
    await db.destroy();
  }
}

describe('backup and restore (the functions behind npm run backup / npm run restore)', () => {
  it('restores into a fresh database every booking, client, step, photo reference and exclusion constraint', async () => {
    const file = join(scratch, 'dwell.dump');
    const binDir = findPostgresBin();
    dumpDatabase(binDir, source.url, file);
    expect((await stat(file)).size).toBeGreaterThan(1000);
    await restoreDatabase(binDir, testEnv().adminUrl, restoredName, file);

    const before = await snapshot(source.url);
    const after = await snapshot(withDatabase(testEnv().adminUrl, restoredName));
    expect(before.bookings.length).toBeGreaterThan(10);
    expect(before.photos).toHaveLength(5);
    // The double-booking guards (exclusion constraints) must come back too, not just the rows.
    expect(before.constraints.length).toBeGreaterThan(0);
    expect(after).toEqual(before);
  });

  it('a broken file leaves the existing database untouched and says what failed', async () => {
    const bad = join(scratch, 'not-a-dump');
    await import('node:fs/promises').then((fs) => fs.writeFile(bad, 'this is not a pg_dump archive'));
    await expect(restoreDatabase(findPostgresBin(), testEnv().adminUrl, restoredName, bad)).rejects.toThrow(/pg_restore failed/);
    const still = await snapshot(withDatabase(testEnv().adminUrl, restoredName));
    expect(still.bookings.length).toBeGreaterThan(10);
  });
});
