import type { Db } from '@server/db/database';
import type { FollowUpRule } from '@shared/schemas/follow-up-rules.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { findService } from '../services';
import { bookingForMessages, insertPlanned } from './messages.repository';
import { followUpRows } from './plan-messages.service';
import {
  bookingsForFollowUps,
  deleteFollowUpRule,
  dropQueuedFollowUps,
  findFollowUpRule,
  insertFollowUpRule,
  listFollowUpRules,
  updateFollowUpRule,
  type FollowUpRuleInput,
} from './follow-up-rules.repository';

/** Bookings whose last sitting ended within this many days still get a new or edited rule's follow-ups. */
const LOOK_BACK_DAYS = 365;

async function assertService(db: Db, salonId: string, serviceId: string) {
  if (!(await findService(db, salonId, serviceId)))
    throw new AppError('VALIDATION_FAILED', 400, 'Choose one of the salon’s services.', { serviceId: 'Choose one of the salon’s services' });
}

/**
 * Plans (or re-plans) one rule's follow-ups for the service's recent and coming bookings, for clients who
 * opted in to marketing. What was queued under the rule's older version is dropped first.
 */
async function planRule(db: Db, ruleId: string, serviceId: string, now: Date): Promise<void> {
  await dropQueuedFollowUps(db, ruleId);
  for (const bookingId of await bookingsForFollowUps(db, serviceId, new Date(now.getTime() - LOOK_BACK_DAYS * 86_400_000))) {
    const b = await bookingForMessages(db, bookingId);
    if (b?.clientId && b.marketingOptIn) await insertPlanned(db, await followUpRows(db, b, now, ruleId));
  }
}

async function oneRule(db: Db, salonId: string, id: string): Promise<FollowUpRule> {
  return (await findFollowUpRule(db, salonId, id)) ?? Promise.reject(notFound('That follow-up rule'));
}

export async function followUpRules(db: Db, salonId: string): Promise<{ rules: FollowUpRule[] }> {
  return { rules: await listFollowUpRules(db, salonId) };
}

export async function createFollowUpRule(db: Db, salonId: string, input: FollowUpRuleInput, now: Date): Promise<FollowUpRule> {
  const id = await db.transaction().execute(async (trx) => {
    await assertService(trx, salonId, input.serviceId);
    const id = await insertFollowUpRule(trx, salonId, input);
    await planRule(trx, id, input.serviceId, now);
    return id;
  });
  return oneRule(db, salonId, id);
}

export async function editFollowUpRule(db: Db, salonId: string, id: string, input: FollowUpRuleInput, now: Date): Promise<FollowUpRule> {
  await db.transaction().execute(async (trx) => {
    await assertService(trx, salonId, input.serviceId);
    if (!(await updateFollowUpRule(trx, salonId, id, input))) throw notFound('That follow-up rule');
    await planRule(trx, id, input.serviceId, now);
  });
  return oneRule(db, salonId, id);
}

export async function removeFollowUpRule(db: Db, salonId: string, id: string): Promise<void> {
  await db.transaction().execute(async (trx) => {
    if (!(await findFollowUpRule(trx, salonId, id))) throw notFound('That follow-up rule');
    await dropQueuedFollowUps(trx, id);
    await deleteFollowUpRule(trx, salonId, id);
  });
}
