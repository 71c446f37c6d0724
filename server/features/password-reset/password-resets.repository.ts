import { sql } from 'kysely';
import type { Db } from '@server/db/database';

export async function insertReset(db: Db, userId: string, tokenHash: string, expiresAt: Date): Promise<void> {
  await db.insertInto('password_resets').values({ user_id: userId, token_hash: tokenHash, expires_at: expiresAt, used_at: null }).execute();
}

/** Marks an unused, unexpired reset as used and returns its user; undefined when there is none. */
export async function consumeReset(db: Db, tokenHash: string): Promise<string | undefined> {
  const row = await db
    .updateTable('password_resets')
    .set({ used_at: new Date() })
    .where('token_hash', '=', tokenHash)
    .where('used_at', 'is', null)
    .where('expires_at', '>', new Date())
    .returning('user_id')
    .executeTakeFirst();
  return row?.user_id;
}

/** Ends every session of a user (after a password change). */
export async function deleteSessionsOfUser(db: Db, userId: string): Promise<void> {
  await db
    .deleteFrom('session')
    .where(sql<boolean>`sess->'passport'->>'user' = ${userId}`)
    .execute();
}
