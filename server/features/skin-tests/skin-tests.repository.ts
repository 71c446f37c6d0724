import { sql } from 'kysely';
import type { Db } from '../../db/database';
import type { SkinTestRecord } from '../../../shared/rules/skin-test-rule';

// The names are the ones stored with the record (copied by trigger when it was written), so a removed
// account's tests still say who recorded and read them.
const skinTests = (db: Db, salonId: string, clientId: string) =>
  db
    .selectFrom('skin_tests as t')
    .select(['t.id', 't.applied_at', 't.read_at', 't.result', 't.product', 't.notes', 't.recorded_by_name', 't.read_by_name'])
    .where('t.salon_id', '=', salonId)
    .where('t.client_id', '=', clientId);

export function listSkinTests(db: Db, salonId: string, clientId: string) {
  return skinTests(db, salonId, clientId).orderBy('t.applied_at', 'desc').execute();
}
export type SkinTestRow = Awaited<ReturnType<typeof listSkinTests>>[number];

/** One of the client's tests in this salon, or undefined; `lock` holds it for the rest of the transaction. */
export function findSkinTest(db: Db, salonId: string, clientId: string, id: string, lock = false): Promise<SkinTestRow | undefined> {
  const query = skinTests(db, salonId, clientId).where('t.id', '=', id);
  return (lock ? query.forUpdate() : query).executeTakeFirst();
}

export async function insertSkinTest(
  db: Db,
  t: { salonId: string; clientId: string; appliedAt: Date; readAt: Date | null; result: SkinTestRecord['result']; product: string; notes: string; recordedBy: string },
) {
  return db
    .insertInto('skin_tests')
    .values({
      salon_id: t.salonId, client_id: t.clientId, applied_at: t.appliedAt, read_at: t.readAt, result: t.result, product: t.product, notes: t.notes,
      recorded_by: t.recordedBy, read_by: t.readAt ? t.recordedBy : null,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
}

/** Stores the reading of a pending test; false when the test is no longer pending (read meanwhile). */
export async function setSkinTestReading(db: Db, id: string, r: { readAt: Date; result: Exclude<SkinTestRecord['result'], 'pending'>; readBy: string }): Promise<boolean> {
  const updated = await db
    .updateTable('skin_tests')
    .set({ read_at: r.readAt, result: r.result, read_by: r.readBy })
    .where('id', '=', id)
    .where('result', '=', 'pending')
    .executeTakeFirst();
  return Number(updated.numUpdatedRows) === 1;
}

/** What the skin-test rule looks at: recorded tests plus skin-test appointments booked and not yet recorded. */
export async function skinTestRecords(db: Db, clientId: string): Promise<SkinTestRecord[]> {
  const [tests, appointments] = await Promise.all([
    db.selectFrom('skin_tests').select(['applied_at', 'result']).where('client_id', '=', clientId).execute(),
    db
      .selectFrom('bookings as b')
      .innerJoin('services as s', 's.id', 'b.service_id')
      .innerJoin('sittings as si', 'si.booking_id', 'b.id')
      .select(sql<Date>`lower(si.during)`.as('start'))
      .where('b.client_id', '=', clientId)
      .where('s.category', '=', 'skin_test')
      .where('b.status', 'in', ['held', 'booked', 'checked_in'])
      .execute(),
  ]);
  return [
    ...tests.map((t) => ({ appliedAt: t.applied_at, result: t.result })),
    ...appointments.map((a) => ({ appliedAt: a.start, result: 'pending' as const })),
  ];
}
