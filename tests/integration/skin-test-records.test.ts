import { promises as fs } from 'node:fs';
import path from 'node:path';
import { Migrator, type Kysely } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestDb } from '../setup/test-db';
import { signedInAgent, startTestApp, type TestApp } from '../setup/test-app';
import { insertSalon, type SalonFixture } from '../factories/salon';
import { insertUser, type UserFixture } from '../factories/user';
import { insertService, insertTestBooking } from '../factories/booking';
import { futureWeekday, localIso } from '../setup/dates';
import { listAudit } from '@server/features/audit/audit.repository';

// Skin and strand tests are safety records: a reading is stored once and audited, the names of who
// recorded and read them outlive their accounts, and nothing that removes a booking, an account or a
// client takes them along (docs/records.md).

type Agent = Awaited<ReturnType<typeof signedInAgent>>;
let t: TestApp;
let salon: SalonFixture;
let stylist: UserFixture;
let desk: UserFixture;
let owner: UserFixture;
let stylist$: Agent;
let desk$: Agent;
let owner$: Agent;
let otherOwner$: Agent;
const HOUR = 3_600_000;
const iso = (ms: number) => new Date(ms).toISOString();
/** The factories name a user `<role> <n>`; the test reads the name back from the database, not from the code. */
const nameOf = async (u: UserFixture) => (await t.testDb.db.selectFrom('users').select('name').where('id', '=', u.id).executeTakeFirstOrThrow()).name;

beforeAll(async () => {
  t = await startTestApp();
  const db = t.testDb.db;
  salon = await insertSalon(db);
  stylist = await insertUser(db, salon.salonId, 'stylist');
  desk = await insertUser(db, salon.salonId, 'front_desk');
  owner = await insertUser(db, salon.salonId, 'owner');
  const elsewhere = await insertSalon(db);
  const otherOwner = await insertUser(db, elsewhere.salonId, 'owner');
  const signIn = (u: UserFixture) => signedInAgent(t.app, u.email, u.password);
  [stylist$, desk$, owner$, otherOwner$] = await Promise.all([signIn(stylist), signIn(desk), signIn(owner), signIn(otherOwner)]);
});
afterAll(() => t.close());

/** A test applied at `appliedAt` and not read yet, recorded through the API by `by`. */
async function applyTest(clientId: string, appliedAt: string, by: Agent = stylist$) {
  const res = await by.write('post', `/api/clients/${clientId}/skin-tests`, {
    appliedAt,
    readAt: null,
    result: 'pending',
    product: 'Permanent 6.0 with 6 % developer',
    notes: 'Behind the left ear',
  });
  expect(res.status).toBe(201);
  return res.body as { id: string; appliedAt: string; result: string; recordedByName: string | null; readByName: string | null };
}
const newClient = async () => (await insertUser(t.testDb.db, salon.salonId, 'client')).clientId!;
const audit = (entity: 'skin_test' | 'strand_test', id: string) => listAudit(t.testDb.db, salon.salonId, entity, id);
const strand = {
  testedAt: iso(Date.now() - 24 * HOUR),
  tested: 'Lightener 1:2 on a nape strand',
  productType: 'lightener',
  developerPercent: 6,
  minutes: 30,
  result: 'passed',
  notes: '',
  photoId: null,
};

describe('recording the reading of a pending skin test', () => {
  it('stores the read time, result and reader once, and audits it before → after', async () => {
    const clientId = await newClient();
    // Common practice (Cosmetics Europe Recommendation No 27, from memory): the test is read 48 hours after it is applied.
    const appliedMs = Date.now() - 50 * HOUR;
    const applied = await applyTest(clientId, iso(appliedMs));
    expect(applied).toMatchObject({ result: 'pending', recordedByName: await nameOf(stylist), readByName: null });
    const readAt = iso(appliedMs + 48 * HOUR);

    const read = await desk$.write('post', `/api/clients/${clientId}/skin-tests/${applied.id}/reading`, { readAt, result: 'negative' });
    expect(read.status).toBe(200);
    expect(read.body).toMatchObject({ id: applied.id, readAt, result: 'negative', recordedByName: await nameOf(stylist), readByName: await nameOf(desk) });
    expect((await desk$.get(`/api/clients/${clientId}/skin-tests`)).body.tests).toEqual([read.body]);

    const entries = await audit('skin_test', applied.id);
    expect(entries.map((e) => [e.action, e.actor])).toEqual([
      ['recorded', await nameOf(stylist)],
      ['reading recorded', await nameOf(desk)],
    ]);
    expect(entries[0]!.after).toMatchObject({ result: 'pending', readAt: null, notes: 'Behind the left ear' });
    expect(entries[1]!.before).toEqual({ readAt: null, result: 'pending', readByName: null });
    expect(entries[1]!.after).toEqual({ readAt, result: 'negative', readByName: await nameOf(desk) });

    // Stored once: a second reading is refused with the reason, and the first stands.
    const again = await owner$.write('post', `/api/clients/${clientId}/skin-tests/${applied.id}/reading`, {
      readAt: iso(Date.now() - HOUR),
      result: 'positive',
    });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/already read \(negative/);
    expect((await desk$.get(`/api/clients/${clientId}/skin-tests`)).body.tests[0]).toMatchObject({ result: 'negative', readAt });
    expect(await audit('skin_test', applied.id)).toHaveLength(2);
  });

  it('each staff role may record a reading (owner: positive, stylist: unclear)', async () => {
    for (const [agent, result] of [
      [owner$, 'positive'],
      [stylist$, 'unclear'],
    ] as const) {
      const clientId = await newClient();
      const applied = await applyTest(clientId, iso(Date.now() - 49 * HOUR), desk$);
      const read = await agent.write('post', `/api/clients/${clientId}/skin-tests/${applied.id}/reading`, { readAt: iso(Date.now() - HOUR), result });
      expect(read.status).toBe(200);
      expect(read.body.result).toBe(result);
    }
  });

  it('names the applied time in salon time when a reading comes before it', async () => {
    const clientId = await newClient();
    // 17:00 UTC on Tuesday 3 March 2026 is 10:00 in Denver: mountain standard time (UTC−7) until US daylight
    // time starts on the second Sunday of March, 8 March 2026 (IANA time-zone database, America/Denver).
    const applied = await applyTest(clientId, '2026-03-03T17:00:00Z');
    const early = await desk$.write('post', `/api/clients/${clientId}/skin-tests/${applied.id}/reading`, {
      readAt: '2026-03-03T16:59:00Z',
      result: 'negative',
    });
    expect(early.status).toBe(400);
    expect(early.body.error.fields.readAt).toBe('A test cannot be read before it was applied (Tue 3 Mar 2026, 10:00 AM).');
  });

  const refusals: [string, (appliedMs: number) => Record<string, unknown>, string, RegExp][] = [
    ['a read time before the applied time', (a) => ({ readAt: iso(a - 60_000), result: 'negative' }), 'readAt', /before it was applied/],
    ['a read time in the future', () => ({ readAt: iso(Date.now() + HOUR), result: 'negative' }), 'readAt', /future/],
    // Years outside the API's date range are refused by the shared instant schema, naming it.
    ['the far future', () => ({ readAt: '9999-12-31T23:59Z', result: 'negative' }), 'readAt', /between 1900-01-01 and 2199-12-31/],
    ['the year 1', () => ({ readAt: '0001-01-01T00:00Z', result: 'negative' }), 'readAt', /between 1900-01-01 and 2199-12-31/],
    ['a day that does not exist', () => ({ readAt: '2026-02-30T10:00Z', result: 'negative' }), 'readAt', /Not a real date/],
    ['a NUL byte in the time', (a) => ({ readAt: `${iso(a + HOUR)}\u0000`, result: 'negative' }), 'readAt', /.+/],
    ['a time without its offset', () => ({ readAt: '2026-11-30T10:00', result: 'negative' }), 'readAt', /.+/],
    ['a number for the time', () => ({ readAt: 1e308, result: 'negative' }), 'readAt', /.+/],
    ['"pending" as the result', (a) => ({ readAt: iso(a + HOUR), result: 'pending' }), 'result', /.+/],
    ['a lone surrogate as the result', (a) => ({ readAt: iso(a + HOUR), result: '\ud800' }), 'result', /.+/],
    ['no result', (a) => ({ readAt: iso(a + HOUR) }), 'result', /.+/],
    ['a field the reading does not have', (a) => ({ readAt: iso(a + HOUR), result: 'negative', recordedBy: 'someone' }), 'recordedBy', /not allowed/],
  ];
  it.each(refusals)('refuses %s naming the field, and stores nothing', async (_what, body, field, message) => {
    const clientId = await newClient();
    const appliedMs = Date.now() - 49 * HOUR;
    const applied = await applyTest(clientId, iso(appliedMs));
    const res = await desk$.write('post', `/api/clients/${clientId}/skin-tests/${applied.id}/reading`, body(appliedMs));
    expect(res.status).toBe(400);
    expect(res.body.error.fields[field]).toMatch(message);
    expect((await desk$.get(`/api/clients/${clientId}/skin-tests`)).body.tests).toEqual([applied]);
    expect((await audit('skin_test', applied.id)).map((e) => e.action)).toEqual(['recorded']);
  });

  it('refuses a test of another client or another salon, and a malformed body or id, as 4xx; nothing stored', async () => {
    const [mine, someoneElse] = [await newClient(), await newClient()];
    const applied = await applyTest(mine, iso(Date.now() - 49 * HOUR));
    const reading = { readAt: iso(Date.now() - HOUR), result: 'positive' };
    const wrongClient = await desk$.write('post', `/api/clients/${someoneElse}/skin-tests/${applied.id}/reading`, reading);
    expect(wrongClient.status).toBe(404);
    expect(wrongClient.body.error.message).toMatch(/skin test was not found/);
    const wrongSalon = await otherOwner$.write('post', `/api/clients/${mine}/skin-tests/${applied.id}/reading`, reading);
    expect(wrongSalon.status).toBe(404);
    const badId = await desk$.write('post', `/api/clients/${mine}/skin-tests/not-a-test/reading`, reading);
    expect(badId.status).toBe(400);
    expect(badId.body.error.fields.testId).toBeTruthy();
    const notJson = await desk$.agent
      .post(`/api/clients/${mine}/skin-tests/${applied.id}/reading`)
      .set('X-CSRF-Token', (await desk$.get('/api/csrf')).body.token)
      .set('Content-Type', 'application/json')
      .send('{"readAt": ');
    expect(notJson.status).toBe(400);
    await desk$.refreshCsrf();
    expect((await desk$.get(`/api/clients/${mine}/skin-tests`)).body.tests).toEqual([applied]);
  });

  it('refuses, naming the field, a new test read before it was applied or applied in the future', async () => {
    const clientId = await newClient();
    const backwards = await desk$.write('post', `/api/clients/${clientId}/skin-tests`, {
      appliedAt: iso(Date.now() - HOUR),
      readAt: iso(Date.now() - 2 * HOUR),
      result: 'negative',
    });
    expect(backwards.status).toBe(400);
    expect(backwards.body.error.fields.readAt).toMatch(/before it was applied/);
    const ahead = await desk$.write('post', `/api/clients/${clientId}/skin-tests`, { appliedAt: iso(Date.now() + 24 * HOUR), readAt: null, result: 'pending' });
    expect(ahead.status).toBe(400);
    expect(ahead.body.error.fields.appliedAt).toMatch(/book a skin test/);
    expect((await desk$.get(`/api/clients/${clientId}/skin-tests`)).body.tests).toEqual([]);
  });
});

describe('test records are kept', () => {
  it('a deactivated, then removed, staff account leaves the names of who recorded and read the tests', async () => {
    const db = t.testDb.db;
    const leaving = await insertUser(db, salon.salonId, 'stylist');
    const leaving$ = await signedInAgent(t.app, leaving.email, leaving.password);
    const leavingName = await nameOf(leaving);
    const clientId = await newClient();
    const applied = await applyTest(clientId, iso(Date.now() - 49 * HOUR), leaving$);
    await leaving$.write('post', `/api/clients/${clientId}/skin-tests/${applied.id}/reading`, { readAt: iso(Date.now() - HOUR), result: 'negative' });
    const strandRes = await leaving$.write('post', `/api/clients/${clientId}/strand-tests`, strand);
    expect(strandRes.status).toBe(201);
    expect((await audit('strand_test', strandRes.body.id)).map((e) => e.action)).toEqual(['recorded']);

    const deactivated = await owner$.write('post', `/api/owner/setup/staff/${leaving.id}/deactivate`, {});
    expect(deactivated.status).toBe(200);
    const kept = { recordedByName: leavingName, readByName: leavingName };
    expect((await desk$.get(`/api/clients/${clientId}/skin-tests`)).body.tests[0]).toMatchObject(kept);

    // No route removes an account; an operator deleting the row is the worst case the records must survive.
    await db.deleteFrom('users').where('id', '=', leaving.id).execute();
    expect((await desk$.get(`/api/clients/${clientId}/skin-tests`)).body.tests[0]).toMatchObject(kept);
    expect((await desk$.get(`/api/clients/${clientId}/strand-tests`)).body.tests[0]).toMatchObject({ recordedByName: leavingName });
    const row = await db.selectFrom('skin_tests').select(['recorded_by', 'read_by']).where('id', '=', applied.id).executeTakeFirstOrThrow();
    expect(row).toEqual({ recorded_by: null, read_by: null });
  });

  it("cancelling a booking, removing a strand test's photo or the client's sign-in keeps the tests", async () => {
    const db = t.testDb.db;
    const client = await insertUser(db, salon.salonId, 'client');
    const clientId = client.clientId!;
    const applied = await applyTest(clientId, iso(Date.now() - 49 * HOUR));
    const photo = await db
      .insertInto('client_photos')
      .values({
        salon_id: salon.salonId,
        client_id: clientId,
        booking_id: null,
        kind: 'hair_now',
        storage_key: `records-${Date.now()}.jpg`,
        mime: 'image/jpeg',
        bytes: 1,
        width: 1,
        height: 1,
      })
      .returning('id')
      .executeTakeFirstOrThrow();
    const strandTest = (await desk$.write('post', `/api/clients/${clientId}/strand-tests`, { ...strand, photoId: photo.id })).body;
    expect(strandTest.photoId).toBe(photo.id);
    const bookingId = await insertTestBooking(db, {
      salonId: salon.salonId,
      clientId,
      stylistId: stylist.staffId!,
      chairId: salon.chairs[0]!,
      serviceId: await insertService(db, salon.salonId),
      steps: [['hands_on', localIso(futureWeekday(3, 3), '10:00'), localIso(futureWeekday(3, 3), '10:30')]],
    });
    const lists = async () => ({
      skin: (await desk$.get(`/api/clients/${clientId}/skin-tests`)).body.tests.map((x: { id: string }) => x.id),
      strand: (await desk$.get(`/api/clients/${clientId}/strand-tests`)).body.tests.map((x: { id: string }) => x.id),
    });
    const everything = { skin: [applied.id], strand: [strandTest.id] };

    expect((await desk$.write('post', `/api/bookings/${bookingId}/cancel`, { reason: 'Client moved away' })).status).toBe(200);
    expect(await lists()).toEqual(everything);

    // The photo goes at the client's wish; the strand test stays, and its audit log says what changed.
    expect((await desk$.write('delete', `/api/photos/${photo.id}`)).status).toBe(204);
    expect(await lists()).toEqual(everything);
    expect((await desk$.get(`/api/clients/${clientId}/strand-tests`)).body.tests[0].photoId).toBeNull();
    const photoEntry = (await audit('strand_test', strandTest.id)).find((e) => e.action === 'photo removed');
    expect(photoEntry).toMatchObject({ before: { photoId: photo.id }, after: { photoId: null }, actor: await nameOf(desk) });

    await db.deleteFrom('users').where('id', '=', client.id).execute();
    expect(await lists()).toEqual(everything);
  });

  it('removing a client or a salon with tests on record is refused by the database itself', async () => {
    // Dwell has no client archive and no route that deletes a client or a salon; the tables refuse it anyway.
    // Clients and a salon without bookings, so that only the tests stand in the way.
    const db = t.testDb.db;
    const clientId = await newClient();
    await applyTest(clientId, iso(Date.now() - 49 * HOUR));
    const lonely = await insertSalon(db);
    const theirClient = await insertUser(db, lonely.salonId, 'client');
    await db
      .insertInto('strand_tests')
      .values({
        salon_id: lonely.salonId,
        client_id: theirClient.clientId!,
        tested_at: new Date(),
        tested: 'Toner on a nape strand',
        product_type: 'toner',
        minutes: 20,
        result: 'passed',
        recorded_by: null,
      })
      .execute();
    // 23503 is PostgreSQL's foreign_key_violation (PostgreSQL manual, Appendix A: error codes).
    const refusedByTests = (table: string) => ({ code: '23503', constraint: expect.stringMatching(new RegExp(`^${table}_(client|salon)_id_fkey$`)) });
    await expect(db.deleteFrom('clients').where('id', '=', clientId).execute()).rejects.toMatchObject(refusedByTests('skin_tests'));
    await expect(db.deleteFrom('clients').where('id', '=', theirClient.clientId!).execute()).rejects.toMatchObject(refusedByTests('strand_tests'));
    await expect(db.deleteFrom('salons').where('id', '=', lonely.salonId).execute()).rejects.toMatchObject(refusedByTests('strand_tests'));
    expect(await db.selectFrom('skin_tests').select('id').where('client_id', '=', clientId).execute()).toHaveLength(1);
    expect(await db.selectFrom('strand_tests').select('id').where('client_id', '=', theirClient.clientId!).execute()).toHaveLength(1);
  });
});

describe('the migration that keeps recorder names', () => {
  it('fills the names of existing records from their accounts, and the reader of tests stored already read', async () => {
    const own = await createTestDb();
    try {
      // The app's migrations, loaded through the test runner (which compiles TypeScript) rather than Node's own import.
      const folder = path.resolve('migrations');
      const files = (await fs.readdir(folder)).filter((f) => f.endsWith('.ts'));
      const provider = {
        getMigrations: async () => Object.fromEntries(await Promise.all(files.map(async (f) => [f.replace(/\.ts$/, ''), await import(path.join(folder, f))]))),
      };
      const migrator = new Migrator({ db: own.db, provider });
      // Back to before both of this change's migrations (their down steps run), then records as they were stored then.
      const down = await migrator.migrateTo('20261204T0910_add_salon_country');
      expect(down.error).toBeUndefined();
      // eslint-disable-next-line @typescript-eslint/no-explicit-any -- the tables as an older migration left them, not as schema.ts types them
      const db = own.db as unknown as Kysely<any>;
      const s = await insertSalon(own.db);
      const recorder = await insertUser(own.db, s.salonId, 'stylist');
      const client = await insertUser(own.db, s.salonId, 'client');
      const who = { salon_id: s.salonId, client_id: client.clientId, recorded_by: recorder.id };
      const applied_at = new Date('2026-11-02T17:00:00Z');
      await db
        .insertInto('skin_tests')
        .values([
          { ...who, applied_at, read_at: new Date('2026-11-04T17:00:00Z'), result: 'negative' },
          { ...who, applied_at, read_at: null, result: 'pending' },
        ])
        .execute();
      await db
        .insertInto('strand_tests')
        .values({ ...who, tested_at: applied_at, tested: 'Lightener on a nape strand', product_type: 'lightener', minutes: 30, result: 'passed' })
        .execute();

      expect((await migrator.migrateToLatest()).error).toBeUndefined();
      const name = (await own.db.selectFrom('users').select('name').where('id', '=', recorder.id).executeTakeFirstOrThrow()).name;
      const skin = await own.db.selectFrom('skin_tests').select(['result', 'recorded_by_name', 'read_by', 'read_by_name']).orderBy('result').execute();
      expect(skin).toEqual([
        { result: 'negative', recorded_by_name: name, read_by: recorder.id, read_by_name: name },
        { result: 'pending', recorded_by_name: name, read_by: null, read_by_name: null },
      ]);
      expect(await own.db.selectFrom('strand_tests').select('recorded_by_name').execute()).toEqual([{ recorded_by_name: name }]);
    } finally {
      await own.drop();
    }
  });
});
