import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { Db } from '../db/database';
import { notFound } from '../lib/app-error';
import { findClientAccount, findClientIdForUser } from '../features/clients/clients.repository';

/**
 * The client record a user may see: their own (role client) or any of their salon's (staff). Anything
 * else answers 404, never 403, so nobody learns that someone else's record exists.
 */
export async function clientIdFor(db: Db, user: SessionUser, clientId: string): Promise<string> {
  const client = await findClientAccount(db, user.salonId, clientId);
  if (!client || (user.role === 'client' && client.userId !== user.id)) throw notFound('That client');
  return client.id;
}

/** The signed-in client's own record; a client account always has one once it signs up. */
export async function myClientId(db: Db, user: SessionUser): Promise<string> {
  const id = await findClientIdForUser(db, user.id, user.salonId);
  if (!id) throw notFound('Your client record');
  return id;
}
