import { sql } from 'kysely';
import type { Db } from '@server/db/database';

/**
 * Serialises booking writes per stylist for the rest of the transaction. The exclusion constraints guard
 * chairs, basins and hands; the client cap and the skin-test rule cannot be constraints, so two requests for
 * one stylist must not both check them before either writes. Locks are taken in id order (no deadlock).
 */
export async function lockStylists(db: Db, stylistIds: string[]): Promise<void> {
  for (const id of [...new Set(stylistIds)].sort()) {
    await sql`select pg_advisory_xact_lock(hashtextextended(${`stylist:${id}`}, 0))`.execute(db);
  }
}
