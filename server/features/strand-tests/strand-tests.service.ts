import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { RecordStrandTest, StrandTest } from '@shared/schemas/strand-test.schemas';
import type { Db } from '@server/db/database';
import { invalidField } from '@server/lib/app-error';
import { clientIdFor } from '@server/auth/client-access';
import { clientPhotoIds } from '../consultations';
import { checkSalonStrength } from '../mix-logs';
import { storeTestRecord } from '../test-records';
import { findStrandTest, insertStrandTest, listStrandTests } from './strand-tests.repository';

export async function strandTestsOf(db: Db, user: SessionUser, clientId: string): Promise<{ tests: StrandTest[] }> {
  await clientIdFor(db, user, clientId);
  return { tests: await listStrandTests(db, user.salonId, clientId) };
}

/** A strand test, held to the salon's developer maximum and showing one of the client's own photos; audited. */
export async function recordStrandTest(db: Db, user: SessionUser, clientId: string, body: RecordStrandTest): Promise<StrandTest> {
  await clientIdFor(db, user, clientId);
  await checkSalonStrength(db, user.salonId, body.developerPercent, 'developerPercent');
  if (body.photoId && (await clientPhotoIds(db, clientId, [body.photoId])).length === 0) throw invalidField('photoId', 'Pick one of this client’s photos.');
  return storeTestRecord(db, user, {
    entity: 'strand_test',
    store: (trx) => insertStrandTest(trx, { ...body, salonId: user.salonId, clientId, recordedBy: user.id }),
    find: (trx, id) => findStrandTest(trx, user.salonId, clientId, id),
  });
}
