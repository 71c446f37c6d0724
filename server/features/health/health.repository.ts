import { sql } from 'kysely';
import type { Db } from '@server/db/database';

/** One round trip to PostgreSQL; throws when it cannot be reached. */
export async function pingDatabase(db: Db): Promise<void> {
  await sql`select 1`.execute(db);
}
