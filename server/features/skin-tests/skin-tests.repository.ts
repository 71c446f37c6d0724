import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { SkinTestRecord } from '@shared/rules/skin-test-rule';
import type { SkinTest, SkinTestClearance } from '@shared/schemas/skin-test.schemas';

// The names are the ones stored with the record (copied by trigger when it was written), so a removed
// account's tests still say who recorded and read them.
const skinTests = (db: Db, salonId: string, clientId: string) =>
  db
    .selectFrom('skin_tests as t')
    .select(['t.id', 't.applied_at', 't.read_at', 't.result', 't.product', 't.notes', 't.recorded_by_name', 't.read_by_name'])
    .where('t.salon_id', '=', salonId)
    .where('t.client_id', '=', clientId);
type SkinTestRow = Awaited<ReturnType<ReturnType<typeof skinTests>['execute']>>[number];

const toSkinTest = (t: SkinTestRow): SkinTest => ({
  id: t.id,
  appliedAt: t.applied_at.toISOString(),
  readAt: t.read_at?.toISOString() ?? null,
  result: t.result,
  product: t.product,
  notes: t.notes,
  recordedByName: t.recorded_by_name,
  readByName: t.read_by_name,
});

/** A client's skin tests in this salon, newest first. */
export async function listSkinTests(db: Db, salonId: string, clientId: string): Promise<SkinTest[]> {
  return (await skinTests(db, salonId, clientId).orderBy('t.applied_at', 'desc').execute()).map(toSkinTest);
}

/** One of the client's tests in this salon, or undefined; `lock` holds it for the rest of the transaction. */
export async function findSkinTest(db: Db, salonId: string, clientId: string, id: string, lock = false): Promise<SkinTest | undefined> {
  const query = skinTests(db, salonId, clientId).where('t.id', '=', id);
  const row = await (lock ? query.forUpdate() : query).executeTakeFirst();
  return row && toSkinTest(row);
}

export async function insertSkinTest(
  db: Db,
  t: {
    salonId: string;
    clientId: string;
    appliedAt: Date;
    readAt: Date | null;
    result: SkinTestRecord['result'];
    product: string;
    notes: string;
    recordedBy: string;
  },
): Promise<string> {
  const row = await db
    .insertInto('skin_tests')
    .values({
      salon_id: t.salonId,
      client_id: t.clientId,
      applied_at: t.appliedAt,
      read_at: t.readAt,
      result: t.result,
      product: t.product,
      notes: t.notes,
      recorded_by: t.recordedBy,
      read_by: t.readAt ? t.recordedBy : null,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** Stores the reading of a pending test; false when the test is no longer pending (read meanwhile). */
export async function setSkinTestReading(
  db: Db,
  id: string,
  r: { readAt: Date; result: Exclude<SkinTestRecord['result'], 'pending'>; readBy: string },
): Promise<boolean> {
  const updated = await db
    .updateTable('skin_tests')
    .set({ read_at: r.readAt, result: r.result, read_by: r.readBy })
    .where('id', '=', id)
    .where('result', '=', 'pending')
    .executeTakeFirst();
  return Number(updated.numUpdatedRows) === 1;
}

/**
 * What the skin-test rule looks at: every recorded test, and skin-test appointments in the book that no recorded
 * test stands for yet (a test recorded on the appointment's day stands for it). The rule itself decides how much
 * an unread or booked test counts (shared/rules/skin-test-rule.ts).
 */
export async function skinTestRecords(db: Db, clientId: string): Promise<SkinTestRecord[]> {
  return (await skinTestRecordsOf(db, [clientId])).get(clientId) ?? [];
}

/** The same records for several clients at once (a day's bookings), by client id. */
export async function skinTestRecordsOf(db: Db, clientIds: readonly string[]): Promise<Map<string, SkinTestRecord[]>> {
  const byClient = new Map<string, SkinTestRecord[]>(clientIds.map((id) => [id, []]));
  if (clientIds.length === 0) return byClient;
  const [tests, appointments] = await Promise.all([
    db.selectFrom('skin_tests').select(['client_id', 'applied_at', 'result', 'created_at', 'read_recorded_at']).where('client_id', 'in', clientIds).execute(),
    db
      .selectFrom('bookings as b')
      .innerJoin('services as s', 's.id', 'b.service_id')
      .innerJoin('sittings as si', 'si.booking_id', 'b.id')
      .select(['b.client_id', sql<Date>`lower(si.during)`.as('start'), 'b.created_at'])
      .where('b.client_id', 'in', clientIds)
      .where('s.category', '=', 'skin_test')
      .where('b.status', 'in', ['held', 'booked', 'checked_in'])
      .execute(),
  ]);
  const recordedDays = new Set(tests.map((t) => `${t.client_id}|${t.applied_at.toISOString().slice(0, 10)}`));
  // A reading counts from when it was written down: a clearance must come after the reaction was known.
  for (const t of tests) byClient.get(t.client_id)!.push({ appliedAt: t.applied_at, recordedAt: t.read_recorded_at ?? t.created_at, result: t.result });
  for (const a of appointments) {
    if (!a.client_id || recordedDays.has(`${a.client_id}|${a.start.toISOString().slice(0, 10)}`)) continue;
    byClient.get(a.client_id)?.push({ appliedAt: a.start, recordedAt: a.created_at, result: 'pending', booked: true });
  }
  return byClient;
}

/** The owner's clearances of positive skin tests for this client (when each was recorded). */
export async function skinTestClearances(db: Db, clientId: string): Promise<{ at: Date }[]> {
  return (await skinTestClearancesOf(db, [clientId])).get(clientId) ?? [];
}

export async function skinTestClearancesOf(db: Db, clientIds: readonly string[]): Promise<Map<string, { at: Date }[]>> {
  const byClient = new Map<string, { at: Date }[]>(clientIds.map((id) => [id, []]));
  if (clientIds.length === 0) return byClient;
  const rows = await db.selectFrom('skin_test_clearances').select(['client_id', 'recorded_at']).where('client_id', 'in', clientIds).execute();
  for (const r of rows) byClient.get(r.client_id)!.push({ at: r.recorded_at });
  return byClient;
}

/** The owner's clearances for a client, oldest first, with who recorded each (the name kept beside the id). */
export async function listClearances(db: Db, salonId: string, clientId: string): Promise<SkinTestClearance[]> {
  const rows = await db
    .selectFrom('skin_test_clearances')
    .select(['id', 'recorded_at', 'recorded_by_name', 'reason'])
    .where('salon_id', '=', salonId)
    .where('client_id', '=', clientId)
    .orderBy('recorded_at')
    .orderBy('id')
    .execute();
  return rows.map((c) => ({ id: c.id, recordedAt: c.recorded_at.toISOString(), recordedByName: c.recorded_by_name, reason: c.reason }));
}

export async function insertClearance(
  db: Db,
  c: { salonId: string; clientId: string; recordedBy: string; recordedByName: string; reason: string },
): Promise<string> {
  const row = await db
    .insertInto('skin_test_clearances')
    .values({ salon_id: c.salonId, client_id: c.clientId, recorded_by: c.recordedBy, recorded_by_name: c.recordedByName, reason: c.reason })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** A client's date of birth (YYYY-MM-DD, or null) and whether a guardian's consent is on record. */
export async function clientAgeRecord(db: Db, clientId: string): Promise<{ dateOfBirth: string | null; hasGuardianConsent: boolean }> {
  const row = await db
    .selectFrom('clients as c')
    .select([
      sql<string | null>`to_char(c.date_of_birth, 'YYYY-MM-DD')`.as('dateOfBirth'),
      sql<boolean>`exists (select 1 from guardian_consents g where g.client_id = c.id)`.as('hasGuardianConsent'),
    ])
    .where('c.id', '=', clientId)
    .executeTakeFirst();
  return row ?? { dateOfBirth: null, hasGuardianConsent: false };
}
