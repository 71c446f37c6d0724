import type { Db } from '@server/db/database';

export interface StoredAnswer {
  route: string;
  requestHash: string | null;
  status: number;
  response: unknown;
}

/**
 * Claims the key for this user's request: true when it was free. A second request with the same key waits at
 * the primary key for the first one's transaction, then finds the key taken (or free again after a rollback).
 */
export async function claimIdempotencyKey(db: Db, userId: string, key: string, route: string, requestHash: string): Promise<boolean> {
  const row = await db
    .insertInto('idempotency_keys')
    .values({ user_id: userId, key, route, request_hash: requestHash, status: 0, response: 'null' })
    .onConflict((oc) => oc.columns(['user_id', 'key']).doNothing())
    .returning('key')
    .executeTakeFirst();
  return row !== undefined;
}

/** The answer stored under this user's key. */
export async function findIdempotent(db: Db, userId: string, key: string): Promise<StoredAnswer | undefined> {
  const row = await db
    .selectFrom('idempotency_keys')
    .select(['route', 'request_hash', 'status', 'response'])
    .where('user_id', '=', userId)
    .where('key', '=', key)
    .executeTakeFirst();
  return row && { route: row.route, requestHash: row.request_hash, status: row.status, response: row.response };
}

/** Keeps the answer under the key the request claimed (in the same transaction as the work). */
export async function saveIdempotent(db: Db, userId: string, key: string, status: number, response: unknown): Promise<void> {
  await db
    .updateTable('idempotency_keys')
    .set({ status, response: JSON.stringify(response) })
    .where('user_id', '=', userId)
    .where('key', '=', key)
    .execute();
}
