import { sql } from 'kysely';
import type { Db } from '../../db/database';
import type { SkinTestRecord } from '../../../shared/rules/skin-test-rule';

export function listSkinTests(db: Db, salonId: string, clientId: string) {
  return db
    .selectFrom('skin_tests as t')
    .leftJoin('users as u', 'u.id', 't.recorded_by')
    .select(['t.id', 't.applied_at', 't.read_at', 't.result', 't.product', 't.notes', 'u.name as recorded_by_name'])
    .where('t.salon_id', '=', salonId)
    .where('t.client_id', '=', clientId)
    .orderBy('t.applied_at', 'desc')
    .execute();
}

export async function insertSkinTest(
  db: Db,
  t: { salonId: string; clientId: string; appliedAt: Date; readAt: Date | null; result: SkinTestRecord['result']; product: string; notes: string; recordedBy: string },
) {
  return db
    .insertInto('skin_tests')
    .values({ salon_id: t.salonId, client_id: t.clientId, applied_at: t.appliedAt, read_at: t.readAt, result: t.result, product: t.product, notes: t.notes, recorded_by: t.recordedBy })
    .returning('id')
    .executeTakeFirstOrThrow();
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
