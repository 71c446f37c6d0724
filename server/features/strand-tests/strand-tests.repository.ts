import type { Db } from '../../db/database';
import type { RecordStrandTest } from '../../../shared/schemas/strand-test.schemas';

export function listStrandTests(db: Db, salonId: string, clientId: string) {
  return db
    .selectFrom('strand_tests as t')
    .leftJoin('users as u', 'u.id', 't.recorded_by')
    .select(['t.id', 't.tested_at', 't.tested', 't.product_type', 't.developer_percent', 't.minutes', 't.result', 't.notes', 't.photo_id', 'u.name as recorded_by_name'])
    .where('t.salon_id', '=', salonId)
    .where('t.client_id', '=', clientId)
    .orderBy('t.tested_at', 'desc')
    .execute();
}
export type StrandTestRow = Awaited<ReturnType<typeof listStrandTests>>[number];

export async function insertStrandTest(db: Db, t: RecordStrandTest & { salonId: string; clientId: string; recordedBy: string }): Promise<string> {
  const { id } = await db
    .insertInto('strand_tests')
    .values({
      salon_id: t.salonId, client_id: t.clientId, tested_at: new Date(t.testedAt), tested: t.tested, product_type: t.productType,
      developer_percent: t.developerPercent, minutes: t.minutes, result: t.result, notes: t.notes, photo_id: t.photoId, recorded_by: t.recordedBy,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return id;
}
