import type { Db } from '@server/db/database';
import type { FollowUpRule } from '@shared/schemas/follow-up-rules.schemas';

const COLUMNS = ['r.id', 'r.service_id as serviceId', 'sv.name as serviceName', 'r.title', 'r.body as text', 'r.rrule', 'r.version'] as const;

/** A service's follow-up rules (planning reads these inside the booking's transaction). */
export async function followUpRulesForService(db: Db, serviceId: string): Promise<FollowUpRule[]> {
  return db
    .selectFrom('follow_up_rules as r')
    .innerJoin('services as sv', 'sv.id', 'r.service_id')
    .select(COLUMNS)
    .where('r.service_id', '=', serviceId)
    .orderBy('r.created_at')
    .execute();
}

export async function listFollowUpRules(db: Db, salonId: string): Promise<FollowUpRule[]> {
  return db
    .selectFrom('follow_up_rules as r')
    .innerJoin('services as sv', 'sv.id', 'r.service_id')
    .select(COLUMNS)
    .where('r.salon_id', '=', salonId)
    .orderBy('sv.name')
    .orderBy('r.created_at')
    .execute();
}

export async function findFollowUpRule(db: Db, salonId: string, id: string): Promise<FollowUpRule | undefined> {
  return db
    .selectFrom('follow_up_rules as r')
    .innerJoin('services as sv', 'sv.id', 'r.service_id')
    .select(COLUMNS)
    .where('r.salon_id', '=', salonId)
    .where('r.id', '=', id)
    .executeTakeFirst();
}

export interface FollowUpRuleInput {
  serviceId: string;
  title: string;
  text: string;
  rrule: string;
}

export async function insertFollowUpRule(db: Db, salonId: string, input: FollowUpRuleInput): Promise<string> {
  const row = await db
    .insertInto('follow_up_rules')
    .values({ salon_id: salonId, service_id: input.serviceId, title: input.title, body: input.text, rrule: input.rrule })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** Each edit bumps the version, which is part of every planned message's dedupe key. */
export async function updateFollowUpRule(db: Db, salonId: string, id: string, input: FollowUpRuleInput): Promise<boolean> {
  const result = await db
    .updateTable('follow_up_rules')
    .set((eb) => ({ service_id: input.serviceId, title: input.title, body: input.text, rrule: input.rrule, version: eb('version', '+', 1) }))
    .where('salon_id', '=', salonId)
    .where('id', '=', id)
    .executeTakeFirst();
  return result.numUpdatedRows > 0n;
}

export async function deleteFollowUpRule(db: Db, salonId: string, id: string): Promise<boolean> {
  const result = await db.deleteFrom('follow_up_rules').where('salon_id', '=', salonId).where('id', '=', id).executeTakeFirst();
  return result.numDeletedRows > 0n;
}

/** Queued follow-ups of a rule (its dedupe keys carry the rule id) will not go out: the rule changed or went. */
export async function dropQueuedFollowUps(db: Db, ruleId: string): Promise<void> {
  await db
    .updateTable('messages')
    .set({ status: 'dropped' })
    .where('kind', '=', 'follow_up')
    .where('status', '=', 'queued')
    .where('dedupe_key', 'like', `%:${ruleId}.%`)
    .execute();
}

/** Bookings of a service whose last sitting ended recently or is ahead: the ones a changed rule re-plans. */
export async function bookingsForFollowUps(db: Db, serviceId: string, since: Date): Promise<string[]> {
  const rows = await db
    .selectFrom('bookings as b')
    .innerJoin('sittings as s', 's.booking_id', 'b.id')
    .select('b.id')
    .where('b.service_id', '=', serviceId)
    .where('b.status', 'in', ['booked', 'checked_in', 'finished', 'checked_out'])
    .groupBy('b.id')
    .having((eb) => eb.fn.max(eb.fn('upper', ['s.during'])), '>', since)
    .execute();
  return rows.map((r) => r.id);
}
