import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { HairHistory, HairHistoryResponse } from '@shared/schemas/hair-history.schemas';
import { HairHistorySchema } from '@shared/schemas/hair-history.schemas';

export async function findHairHistory(db: Db, clientId: string): Promise<HairHistoryResponse> {
  const row = await db.selectFrom('hair_histories').select(['answers', 'updated_at']).where('client_id', '=', clientId).executeTakeFirst();
  if (!row) return { answers: null, updatedAt: null };
  // Parsed on the way out too: answers saved under an older form version fail loudly here, not in the browser.
  return { answers: HairHistorySchema.parse(row.answers), updatedAt: row.updated_at.toISOString() };
}

export async function saveHairHistory(db: Db, clientId: string, answers: HairHistory): Promise<HairHistoryResponse> {
  const json = JSON.stringify(answers);
  const row = await db
    .insertInto('hair_histories')
    .values({ client_id: clientId, answers: json })
    .onConflict((oc) => oc.column('client_id').doUpdateSet({ answers: json, updated_at: sql`now()` }))
    .returning(['answers', 'updated_at'])
    .executeTakeFirstOrThrow();
  return { answers: HairHistorySchema.parse(row.answers), updatedAt: row.updated_at.toISOString() };
}
