import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { ClientSummary } from '@shared/schemas/client.schemas';
import type { MessageChannelChoice } from '@shared/schemas/contact.schemas';

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
    query = query.where((eb) => eb.or([eb('name', 'ilike', pattern), eb('email', 'ilike', pattern), eb(sql`coalesce(phone, '')`, 'ilike', pattern)]));
  }
  return query.orderBy('name').limit(50).execute();
}

export async function findClient(db: Db, salonId: string, id: string) {
  return db
    .selectFrom('clients')
    .select([
      'id',
      'name',
      'email',
      'phone',
      'notes',
      'message_channel as messageChannel',
      'marketing_opt_in as marketingOptIn',
      'sms_stopped_at as smsStoppedAt',
    ])
    .where('salon_id', '=', salonId)
    .where('id', '=', id)
    .executeTakeFirst();
}

/** The client record of a client's account; with `salonId`, only within that salon. */
export async function findClientIdForUser(db: Db, userId: string, salonId?: string): Promise<string | undefined> {
  let query = db.selectFrom('clients').select('id').where('user_id', '=', userId);
  if (salonId) query = query.where('salon_id', '=', salonId);
  return (await query.executeTakeFirst())?.id;
}

/** A client of this salon and the account it belongs to (null for a client only the desk knows). */
export async function findClientAccount(db: Db, salonId: string, clientId: string): Promise<{ id: string; userId: string | null } | undefined> {
  return db.selectFrom('clients').select(['id', 'user_id as userId']).where('id', '=', clientId).where('salon_id', '=', salonId).executeTakeFirst();
}

export interface ClientContactChange {
  name?: string;
  email?: string | null;
  phone: string | null;
  messageChannel: MessageChannelChoice;
  marketingOptIn: boolean;
}

/** Contact details and message preferences; a changed phone number starts with SMS on again. */
export async function updateClientContact(db: Db, salonId: string, id: string, change: ClientContactChange): Promise<boolean> {
  const result = await db
    .updateTable('clients')
    .set((eb) => ({
      ...(change.name !== undefined && { name: change.name }),
      ...(change.email !== undefined && { email: change.email }),
      phone: change.phone,
      message_channel: change.messageChannel,
      marketing_opt_in: change.marketingOptIn,
      sms_stopped_at: eb.case().when('phone', 'is distinct from', change.phone).then(null).else(eb.ref('sms_stopped_at')).end(),
    }))
    .where('salon_id', '=', salonId)
    .where('id', '=', id)
    .executeTakeFirst();
  return result.numUpdatedRows > 0n;
}

/** Replaces the team's notes on a client of this salon; answers the notes before, or null when no such client. */
export async function replaceClientNotes(db: Db, salonId: string, id: string, notes: string): Promise<string | null> {
  const before = await db.selectFrom('clients').select('notes').where('salon_id', '=', salonId).where('id', '=', id).forUpdate().executeTakeFirst();
  if (!before) return null;
  await db.updateTable('clients').set({ notes }).where('salon_id', '=', salonId).where('id', '=', id).execute();
  return before.notes;
}

/** An inbound STOP (stop = true) or START from this number, for every client with it; their ids. */
export async function setSmsStopped(db: Db, phone: string, stop: boolean, now: Date): Promise<{ id: string; salonId: string }[]> {
  return db
    .updateTable('clients')
    .set({ sms_stopped_at: stop ? now : null })
    .where('phone', '=', phone)
    .returning(['id', 'salon_id as salonId'])
    .execute();
}
