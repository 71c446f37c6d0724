import type { Db } from '@server/db/database';

/**
 * Records that a sitting's client is told of a delay. The table's key (sitting, minutes) is the once-only rule:
 * false when this delay was already told, whoever told it.
 */
export async function recordRunningLate(db: Db, sittingId: string, minutesLate: number, at: Date, byUserId: string | null): Promise<boolean> {
  const row = await db
    .insertInto('running_late_notices')
    .values({ sitting_id: sittingId, minutes_late: minutesLate, told_at: at, told_by: byUserId })
    .onConflict((oc) => oc.columns(['sitting_id', 'minutes_late']).doNothing())
    .returning('sitting_id')
    .executeTakeFirst();
  return row !== undefined;
}

/** The delays each sitting's client was told of, earliest first. */
export async function runningLateTold(db: Db, sittingIds: string[]): Promise<Map<string, Array<{ minutesLate: number; at: Date }>>> {
  const out = new Map<string, Array<{ minutesLate: number; at: Date }>>();
  if (sittingIds.length === 0) return out;
  const rows = await db
    .selectFrom('running_late_notices')
    .select(['sitting_id', 'minutes_late', 'told_at'])
    .where('sitting_id', 'in', sittingIds)
    .orderBy('told_at')
    .execute();
  for (const r of rows) out.set(r.sitting_id, [...(out.get(r.sitting_id) ?? []), { minutesLate: r.minutes_late, at: r.told_at }]);
  return out;
}
