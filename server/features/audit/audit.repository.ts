import { sql } from 'kysely';
import type { Db } from '@server/db/database';

export interface AuditInput {
  salonId: string;
  actorUserId: string | null;
  entity:
    | 'booking'
    | 'standby_entry'
    | 'window_offer'
    | 'salon'
    | 'service'
    | 'staff'
    | 'chair'
    | 'basin'
    | 'skin_test'
    | 'strand_test'
    | 'skin_test_clearance'
    | 'client'
    | 'quote'
    | 'retail_product';
  entityId: string;
  action: string;
  before?: unknown;
  after?: unknown;
}

/** Every change to a booking, a test record or the salon's set-up writes one entry: who, when, what, and the record before and after. */
export async function writeAudit(db: Db, entry: AuditInput): Promise<void> {
  await db
    .insertInto('audit_log')
    .values({
      salon_id: entry.salonId,
      actor_user_id: entry.actorUserId,
      entity: entry.entity,
      entity_id: entry.entityId,
      action: entry.action,
      before: entry.before === undefined ? null : JSON.stringify(entry.before),
      after: entry.after === undefined ? null : JSON.stringify(entry.after),
    })
    .execute();
}

export function listAudit(db: Db, salonId: string, entity: AuditInput['entity'], entityId: string) {
  return db
    .selectFrom('audit_log as a')
    .leftJoin('users as u', 'u.id', 'a.actor_user_id')
    .select(['a.at', 'a.action', 'a.before', 'a.after', sql<string | null>`u.name`.as('actor')])
    .where('a.salon_id', '=', salonId)
    .where('a.entity', '=', entity)
    .where('a.entity_id', '=', entityId)
    .orderBy('a.at')
    .orderBy('a.id')
    .execute();
}
