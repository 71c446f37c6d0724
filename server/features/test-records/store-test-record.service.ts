import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { Db } from '@server/db/database';
import { writeAudit } from '../audit';

export interface TestRecordWrite<T> {
  /** The audit log's name for the kind of record. */
  entity: 'skin_test' | 'strand_test';
  /** Stores the record; answers its id. */
  store: (trx: Db) => Promise<string>;
  /** Reads the stored record back as the list shows it. */
  find: (trx: Db, id: string) => Promise<T | undefined>;
  /** What else must change with the record, in the same transaction (a skin test replans the client's messages). */
  then?: (trx: Db) => Promise<unknown>;
}

/**
 * Skin and strand tests are written the same way: in one transaction the record is stored, read back as the team
 * sees it, and written to the audit log as recorded, by whom (docs/records.md: test records are never deleted).
 */
export async function storeTestRecord<T>(db: Db, user: SessionUser, write: TestRecordWrite<T>): Promise<T> {
  return db.transaction().execute(async (trx) => {
    const id = await write.store(trx);
    const record = (await write.find(trx, id))!;
    await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: write.entity, entityId: id, action: 'recorded', after: record });
    await write.then?.(trx);
    return record;
  });
}
