import { sql } from 'kysely';
import type { Db } from '@server/db/database';

/**
 * Counts one hit for `key` in its window, in one statement (concurrent hits each get their own count): a window
 * that has ended starts again at 1. Answers the hits so far and when the window ends.
 */
export async function hitRateLimit(db: Db, key: string, windowMs: number): Promise<{ hits: number; resetAt: Date }> {
  const window = sql`make_interval(secs => ${windowMs / 1000})`;
  const row = await db
    .insertInto('rate_limit_hits')
    .values({ key, hits: 1, reset_at: sql<Date>`now() + ${window}` })
    .onConflict((oc) =>
      oc.column('key').doUpdateSet({
        hits: sql<number>`case when rate_limit_hits.reset_at <= now() then 1 else rate_limit_hits.hits + 1 end`,
        reset_at: sql<Date>`case when rate_limit_hits.reset_at <= now() then now() + ${window} else rate_limit_hits.reset_at end`,
      }),
    )
    .returning(['hits', 'reset_at'])
    .executeTakeFirstOrThrow();
  return { hits: row.hits, resetAt: row.reset_at };
}

/** Takes one hit back (a request the limit was told not to count after all). */
export async function unhitRateLimit(db: Db, key: string): Promise<void> {
  await db
    .updateTable('rate_limit_hits')
    .set({ hits: sql<number>`greatest(hits - 1, 0)` })
    .where('key', '=', key)
    .execute();
}

export async function resetRateLimit(db: Db, key: string): Promise<void> {
  await db.deleteFrom('rate_limit_hits').where('key', '=', key).execute();
}

/** Forgets windows that have ended. */
export async function pruneRateLimits(db: Db): Promise<void> {
  await db
    .deleteFrom('rate_limit_hits')
    .where('reset_at', '<', sql<Date>`now()`)
    .execute();
}
