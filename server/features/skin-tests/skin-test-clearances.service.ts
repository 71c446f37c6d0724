import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { SkinTestClearance } from '@shared/schemas/skin-test.schemas';
import type { Db } from '@server/db/database';
import { AppError } from '@server/lib/app-error';
import { clientIdFor } from '@server/auth/client-access';
import { writeAudit } from '../audit';
import { userName } from '../session';
import { replanAfterSkinTestChange } from '../messages';
import { insertClearance, listClearances, skinTestRecords } from './skin-tests.repository';

/**
 * The owner records that oxidative colour may follow the client's positive skin test (e.g. on written medical
 * advice). Kept for good and audited; colour still needs a newer test read negative (the rule says so).
 */
export async function recordClearance(db: Db, user: SessionUser, clientId: string, reason: string, now: Date): Promise<SkinTestClearance> {
  await clientIdFor(db, user, clientId);
  if (!(await skinTestRecords(db, clientId)).some((r) => r.result === 'positive')) {
    throw new AppError('CONFLICT', 409, 'This client has no positive skin test to clear.');
  }
  return db.transaction().execute(async (trx) => {
    const id = await insertClearance(trx, { salonId: user.salonId, clientId, recordedBy: user.id, recordedByName: await userName(trx, user.id), reason });
    const view = (await listClearances(trx, user.salonId, clientId)).find((c) => c.id === id)!;
    await writeAudit(trx, {
      salonId: user.salonId,
      actorUserId: user.id,
      entity: 'skin_test_clearance',
      entityId: id,
      action: 'recorded',
      after: { ...view, clientId },
    });
    await replanAfterSkinTestChange(trx, clientId, now);
    return view;
  });
}
