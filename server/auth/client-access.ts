import type { SessionUser } from '../../shared/schemas/auth.schemas';
import type { Db } from '../db/database';
import { notFound } from '../lib/app-error';

export { CLIENT_OR_STAFF } from '../../shared/api/endpoint';

/**
 * The client record a user may see: their own (role client) or any of their salon's (staff). Anything
 * else answers 404, never 403, so nobody learns that someone else's record exists.
 */
export async function clientIdFor(db: Db, user: SessionUser, clientId: string): Promise<string> {
  const row = await db
    .selectFrom('clients')
    .select(['id', 'user_id'])
    .where('id', '=', clientId)
    .where('salon_id', '=', user.salonId)
    .executeTakeFirst();
  if (!row || (user.role === 'client' && row.user_id !== user.id)) throw notFound('That client');
  return row.id;
}

/** The signed-in client's own record; a client account always has one once it signs up. */
export async function myClientId(db: Db, user: SessionUser): Promise<string> {
  const row = await db
    .selectFrom('clients')
    .select('id')
    .where('user_id', '=', user.id)
    .where('salon_id', '=', user.salonId)
    .executeTakeFirst();
  if (!row) throw notFound('Your client record');
  return row.id;
}
