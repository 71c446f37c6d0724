import type { Db } from '@server/db/database';
import type { RecordStrandTest, StrandTest } from '@shared/schemas/strand-test.schemas';

// The recorder's name is the one stored with the record, so it outlives their account.
const strandTests = (db: Db, salonId: string, clientId: string) =>
  db
    .selectFrom('strand_tests as t')
    .select([
      't.id',
      't.tested_at',
      't.tested',
      't.product_type',
      't.developer_percent',
      't.minutes',
      't.result',
      't.notes',
      't.photo_id',
      't.recorded_by_name',
    ])
    .where('t.salon_id', '=', salonId)
    .where('t.client_id', '=', clientId);
type StrandTestRow = Awaited<ReturnType<ReturnType<typeof strandTests>['execute']>>[number];

const toStrandTest = (r: StrandTestRow): StrandTest => ({
  id: r.id,
  testedAt: r.tested_at.toISOString(),
  tested: r.tested,
  productType: r.product_type,
  developerPercent: r.developer_percent === null ? null : Number(r.developer_percent),
  minutes: r.minutes,
  result: r.result,
  notes: r.notes,
  photoId: r.photo_id,
  recordedByName: r.recorded_by_name,
});

/** A client's strand tests in this salon, newest first. */
export async function listStrandTests(db: Db, salonId: string, clientId: string): Promise<StrandTest[]> {
  return (await strandTests(db, salonId, clientId).orderBy('t.tested_at', 'desc').execute()).map(toStrandTest);
}

/** One of the client's strand tests in this salon, or undefined. */
export async function findStrandTest(db: Db, salonId: string, clientId: string, id: string): Promise<StrandTest | undefined> {
  const row = await strandTests(db, salonId, clientId).where('t.id', '=', id).executeTakeFirst();
  return row && toStrandTest(row);
}

export async function insertStrandTest(db: Db, t: RecordStrandTest & { salonId: string; clientId: string; recordedBy: string }): Promise<string> {
  const { id } = await db
    .insertInto('strand_tests')
    .values({
      salon_id: t.salonId,
      client_id: t.clientId,
      tested_at: new Date(t.testedAt),
      tested: t.tested,
      product_type: t.productType,
      developer_percent: t.developerPercent,
      minutes: t.minutes,
      result: t.result,
      notes: t.notes,
      photo_id: t.photoId,
      recorded_by: t.recordedBy,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return id;
}

/** Strand tests that show this photo: removing the photo unlinks it from them (the test itself stays). */
export async function strandTestsShowingPhoto(db: Db, photoId: string): Promise<{ id: string; salonId: string }[]> {
  const rows = await db.selectFrom('strand_tests').select(['id', 'salon_id']).where('photo_id', '=', photoId).forUpdate().execute();
  return rows.map((r) => ({ id: r.id, salonId: r.salon_id }));
}
