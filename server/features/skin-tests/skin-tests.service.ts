import type { SessionUser } from '../../../shared/schemas/auth.schemas';
import type { z } from 'zod';
import { READ_BEFORE_APPLIED, type RecordSkinTestReading, type RecordSkinTestSchema, type SkinTest, type SkinTestClearance } from '../../../shared/schemas/skin-test.schemas';
import type { Db } from '../../db/database';
import { AppError, invalidField, notFound } from '../../lib/app-error';
import { writeAudit } from '../audit/audit.repository';
import { findClient } from '../clients/clients.repository';
import { findSalon } from '../salon/salon.repository';
import { findSkinTest, insertSkinTest, listClearances, listSkinTests, setSkinTestReading, type SkinTestRow } from './skin-tests.repository';
import { toClearanceView } from './skin-test-clearances.service';
import { replanAfterSkinTestChange } from '../messages/plan-messages.service';
import { formatDateTime } from '../../../shared/format/date-time';
import { formatFor } from '../../../shared/format/locale';

// The desk's clock may run a little ahead of the server's, and the form sends whole minutes.
const CLOCK_SLACK_MS = 2 * 60_000;

const toView = (t: SkinTestRow): SkinTest => ({
  id: t.id,
  appliedAt: t.applied_at.toISOString(),
  readAt: t.read_at?.toISOString() ?? null,
  result: t.result,
  product: t.product,
  notes: t.notes,
  recordedByName: t.recorded_by_name,
  readByName: t.read_by_name,
});
/** What the audit entry of a reading shows before and after. */
const reading = (t: SkinTest) => ({ readAt: t.readAt, result: t.result, readByName: t.readByName });

async function clientOfSalon(db: Db, salonId: string, clientId: string) {
  if (!(await findClient(db, salonId, clientId))) throw notFound('That client');
}

const inFuture = (at: Date, now: Date) => at.getTime() > now.getTime() + CLOCK_SLACK_MS;

export async function skinTestsOf(db: Db, salonId: string, clientId: string): Promise<{ tests: SkinTest[]; clearances: SkinTestClearance[] }> {
  await clientOfSalon(db, salonId, clientId);
  const [tests, clearances] = await Promise.all([listSkinTests(db, salonId, clientId), listClearances(db, salonId, clientId)]);
  return { tests: tests.map(toView), clearances: clearances.map(toClearanceView) };
}

/** A new test, applied (pending) or already read; written to the audit log with who recorded it. */
export async function recordSkinTest(db: Db, user: SessionUser, clientId: string, body: z.infer<typeof RecordSkinTestSchema>, now: Date): Promise<SkinTest> {
  await clientOfSalon(db, user.salonId, clientId);
  const appliedAt = new Date(body.appliedAt);
  const readAt = body.readAt ? new Date(body.readAt) : null;
  // A test not applied yet is a skin-test appointment (booked), not a record.
  if (inFuture(appliedAt, now)) throw invalidField('appliedAt', 'A test cannot be recorded before it is applied; book a skin test instead.');
  if (readAt && inFuture(readAt, now)) throw invalidField('readAt', 'The reading cannot be in the future.');
  return db.transaction().execute(async (trx) => {
    const { id } = await insertSkinTest(trx, { ...body, salonId: user.salonId, clientId, appliedAt, readAt, recordedBy: user.id });
    const test = toView((await findSkinTest(trx, user.salonId, clientId, id))!);
    await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: 'skin_test', entityId: id, action: 'recorded', after: test });
    await replanAfterSkinTestChange(trx, clientId, now);
    return test;
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
  await clientOfSalon(db, user.salonId, ids.clientId);
  const readAt = new Date(body.readAt);
  return db.transaction().execute(async (trx) => {
    const row = await findSkinTest(trx, user.salonId, ids.clientId, ids.testId, true);
    if (!row) throw notFound('That skin test');
    const before = toView(row);
    const zone = (await findSalon(trx, user.salonId)).timeZone;
    const at = (d: Date) => formatDateTime(d, formatFor(zone), { width: 'short' });
    if (row.result !== 'pending') {
      throw new AppError('CONFLICT', 409, `This skin test was already read (${row.result}, ${at(row.read_at!)}). A reading is recorded once; apply and record a new test to test again.`);
    }
    if (readAt < row.applied_at) throw invalidField('readAt', `${READ_BEFORE_APPLIED} (${at(row.applied_at)}).`);
    if (inFuture(readAt, now)) throw invalidField('readAt', 'The reading cannot be in the future.');
    // The row is locked for this transaction; the pending guard in the update is a second line, not the first.
    if (!(await setSkinTestReading(trx, ids.testId, { readAt, result: body.result, readBy: user.id }))) {
      throw new AppError('CONFLICT', 409, 'This skin test was read by someone else a moment ago.');
    }
    const after = toView((await findSkinTest(trx, user.salonId, ids.clientId, ids.testId))!);
    await writeAudit(trx, { salonId: user.salonId, actorUserId: user.id, entity: 'skin_test', entityId: ids.testId, action: 'reading recorded', before: reading(before), after: reading(after) });
    await replanAfterSkinTestChange(trx, ids.clientId, now);
    return after;
  });
}
