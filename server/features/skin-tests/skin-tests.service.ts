import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { z } from 'zod';
import {
  READ_BEFORE_APPLIED,
  type RecordSkinTestReading,
  type RecordSkinTestSchema,
  type SkinTest,
  type SkinTestClearance,
} from '@shared/schemas/skin-test.schemas';
import type { Db } from '@server/db/database';
import { AppError, invalidField, notFound } from '@server/lib/app-error';
import { clientIdFor } from '@server/auth/client-access';
import { writeAudit } from '../audit';
import { findSalon } from '../salon';
import { storeTestRecord } from '../test-records';
import { findSkinTest, insertSkinTest, listClearances, listSkinTests, setSkinTestReading } from './skin-tests.repository';
import { replanAfterSkinTestChange } from '../messages';
import { formatDateTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

// The desk's clock may run a little ahead of the server's, and the form sends whole minutes.
const CLOCK_SLACK_MS = 2 * 60_000;

/** What the audit entry of a reading shows before and after. */
const reading = (t: SkinTest) => ({ readAt: t.readAt, result: t.result, readByName: t.readByName });

const inFuture = (at: Date, now: Date) => at.getTime() > now.getTime() + CLOCK_SLACK_MS;

export async function skinTestsOf(db: Db, user: SessionUser, clientId: string): Promise<{ tests: SkinTest[]; clearances: SkinTestClearance[] }> {
  await clientIdFor(db, user, clientId);
  const [tests, clearances] = await Promise.all([listSkinTests(db, user.salonId, clientId), listClearances(db, user.salonId, clientId)]);
  return { tests, clearances };
}

/** A new test, applied (pending) or already read; written to the audit log with who recorded it. */
export async function recordSkinTest(db: Db, user: SessionUser, clientId: string, body: z.infer<typeof RecordSkinTestSchema>, now: Date): Promise<SkinTest> {
  await clientIdFor(db, user, clientId);
  const appliedAt = new Date(body.appliedAt);
  const readAt = body.readAt ? new Date(body.readAt) : null;
  // A test not applied yet is a skin-test appointment (booked), not a record.
  if (inFuture(appliedAt, now)) throw invalidField('appliedAt', 'A test cannot be recorded before it is applied; book a skin test instead.');
  if (readAt && inFuture(readAt, now)) throw invalidField('readAt', 'The reading cannot be in the future.');
  return storeTestRecord(db, user, {
    entity: 'skin_test',
    store: (trx) => insertSkinTest(trx, { ...body, salonId: user.salonId, clientId, appliedAt, readAt, recordedBy: user.id }),
    find: (trx, id) => findSkinTest(trx, user.salonId, clientId, id),
    then: (trx) => replanAfterSkinTestChange(trx, clientId, now),
  });
}

/**
 * Records the reading of a pending test: once, by staff of its salon, for its own client, at a time
 * between its application and now. The audit entry keeps the reading before and after.
 */
export async function recordSkinTestReading(
  db: Db,
  user: SessionUser,
  ids: { clientId: string; testId: string },
  body: RecordSkinTestReading,
  now: Date,
): Promise<SkinTest> {
  await clientIdFor(db, user, ids.clientId);
  const readAt = new Date(body.readAt);
  return db.transaction().execute(async (trx) => {
    const before = await findSkinTest(trx, user.salonId, ids.clientId, ids.testId, true);
    if (!before) throw notFound('That skin test');
    const zone = (await findSalon(trx, user.salonId)).timeZone;
    const at = (iso: string) => formatDateTime(new Date(iso), formatFor(zone), { width: 'short' });
    if (before.result !== 'pending') {
      throw new AppError(
        'CONFLICT',
        409,
        `This skin test was already read (${before.result}, ${at(before.readAt!)}). A reading is recorded once; apply and record a new test to test again.`,
      );
    }
    if (readAt < new Date(before.appliedAt)) throw invalidField('readAt', `${READ_BEFORE_APPLIED} (${at(before.appliedAt)}).`);
    if (inFuture(readAt, now)) throw invalidField('readAt', 'The reading cannot be in the future.');
    // The row is locked for this transaction; the pending guard in the update is a second line, not the first.
    if (!(await setSkinTestReading(trx, ids.testId, { readAt, result: body.result, readBy: user.id }))) {
      throw new AppError('CONFLICT', 409, 'This skin test was read by someone else a moment ago.');
    }
    const after = (await findSkinTest(trx, user.salonId, ids.clientId, ids.testId))!;
    await writeAudit(trx, {
      salonId: user.salonId,
      actorUserId: user.id,
      entity: 'skin_test',
      entityId: ids.testId,
      action: 'reading recorded',
      before: reading(before),
      after: reading(after),
    });
    await replanAfterSkinTestChange(trx, ids.clientId, now);
    return after;
  });
}
