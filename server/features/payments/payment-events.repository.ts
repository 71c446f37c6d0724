import type { Db } from '@server/db/database';

/**
 * Records that an event of the payment provider was handled; false when it was already (a webhook delivered
 * twice). Inside the handling transaction, so a delivery that fails half way is handled again in full.
 */
export async function recordEvent(db: Db, event: { eventId: string; type: string; objectId: string | null }): Promise<boolean> {
  const row = await db
    .insertInto('payment_events')
    .values({ event_id: event.eventId, type: event.type, object_id: event.objectId })
    .onConflict((oc) => oc.column('event_id').doNothing())
    .returning('event_id')
    .executeTakeFirst();
  return row !== undefined;
}
