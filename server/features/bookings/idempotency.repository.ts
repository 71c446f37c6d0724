import type { Db } from '@server/db/database';

/** The stored answer to an earlier request with this key from this user, if any. */
export async function findIdempotent(db: Db, userId: string, key: string): Promise<{ status: number; response: unknown } | undefined> {
  return db.selectFrom('idempotency_keys').select(['status', 'response']).where('user_id', '=', userId).where('key', '=', key).executeTakeFirst();
}

export async function saveIdempotent(db: Db, userId: string, key: string, route: string, status: number, response: unknown): Promise<void> {
  await db
    .insertInto('idempotency_keys')
    .values({ user_id: userId, key, route, status, response: JSON.stringify(response) })
    .execute();
}
