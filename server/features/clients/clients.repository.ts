import { sql } from 'kysely';
import type { Db } from '../../db/database';
import type { ClientSummary } from '../../../shared/schemas/client.schemas';

export async function insertClient(
  db: Db,
  client: { salonId: string; userId: string | null; name: string; email: string | null; phone: string | null; notes?: string },
): Promise<string> {
  const row = await db
    .insertInto('clients')
    .values({ salon_id: client.salonId, user_id: client.userId, name: client.name, email: client.email, phone: client.phone, notes: client.notes ?? '' })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** Name, e-mail or phone contains the text (case-insensitive); the first 50 by name. */
export async function searchClients(db: Db, salonId: string, q: string | undefined): Promise<ClientSummary[]> {
  let query = db.selectFrom('clients').select(['id', 'name', 'email', 'phone']).where('salon_id', '=', salonId);
  if (q) {
    // Escape LIKE wildcards so a search for "50%" means the characters, not a pattern.
    const pattern = `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    query = query.where((eb) =>
      eb.or([eb('name', 'ilike', pattern), eb('email', 'ilike', pattern), eb(sql`coalesce(phone, '')`, 'ilike', pattern)]),
    );
  }
  return query.orderBy('name').limit(50).execute();
}

export async function findClient(db: Db, salonId: string, id: string) {
  return db
    .selectFrom('clients')
    .select(['id', 'name', 'email', 'phone', 'notes'])
    .where('salon_id', '=', salonId)
    .where('id', '=', id)
    .executeTakeFirst();
}

export async function findClientIdForUser(db: Db, userId: string): Promise<string | undefined> {
  const row = await db.selectFrom('clients').select('id').where('user_id', '=', userId).executeTakeFirst();
  return row?.id;
}
