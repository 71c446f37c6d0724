import type { z } from 'zod';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { CreateClientSchema } from '@shared/schemas/booking.schemas';
import type { ClientDetail, ClientSummary } from '@shared/schemas/client.schemas';
import { BookingStatusSchema } from '@shared/schemas/common.schemas';
import type { UpdateClientSchema } from '@shared/schemas/contact.schemas';
import type { Db } from '@server/db/database';
import { notFound } from '@server/lib/app-error';
import { storedPhone } from '@server/lib/stored-phone';
import { loadBookingViews } from '../bookings';
import { findHairHistory } from '../hair-history';
import { replanClientMessages } from '../messages';
import { findSalon, salonCountry } from '../salon';
import { writeAudit } from '../audit';
import { findClient, insertClient, replaceClientNotes, searchClients, updateClientContact } from './clients.repository';

export async function findClients(db: Db, user: SessionUser, q: string | undefined): Promise<{ clients: ClientSummary[] }> {
  return { clients: await searchClients(db, user.salonId, q) };
}

/** A client the desk adds (no account); the phone is stored as E.164, read in the salon's country. */
export async function addClient(db: Db, user: SessionUser, body: z.output<typeof CreateClientSchema>): Promise<ClientSummary> {
  const client = { name: body.name, email: body.email || null, phone: storedPhone(body.phone ?? null, await salonCountry(db, user.salonId)) };
  const id = await insertClient(db, { salonId: user.salonId, userId: null, ...client, notes: body.notes });
  return { id, ...client };
}

/** The client card: contact and preferences, every booking, and a reaction the client reported in their hair history. */
export async function clientCard(db: Db, user: SessionUser, id: string): Promise<ClientDetail> {
  const client = await findClient(db, user.salonId, id);
  if (!client) throw notFound('That client');
  const salon = await findSalon(db, user.salonId);
  const bookings = await loadBookingViews(db, { salonId: salon.id, clientId: client.id, statuses: BookingStatusSchema.options }, salon.timeZone);
  const reaction = (await findHairHistory(db, client.id)).answers?.previousReaction;
  const reportedReaction = reaction?.answer === 'yes' ? reaction.details : null;
  return { ...client, smsStoppedAt: client.smsStoppedAt?.toISOString() ?? null, reportedReaction, bookings };
}

/** The desk's edit of contact details and message preferences. */
export async function updateClient(db: Db, user: SessionUser, id: string, typed: z.output<typeof UpdateClientSchema>, now: Date): Promise<ClientSummary> {
  const body = { ...typed, phone: storedPhone(typed.phone, await salonCountry(db, user.salonId)) };
  // Queued messages follow the new details in the same transaction: nothing goes to an old number.
  const found = await db.transaction().execute(async (trx) => {
    if (!(await updateClientContact(trx, user.salonId, id, body))) return false;
    await replanClientMessages(trx, id, now);
    return true;
  });
  if (!found) throw notFound('That client');
  return { id, name: body.name, email: body.email, phone: body.phone };
}

/** The team's notes on a client, replaced as a whole and audited (who wrote what, and what was there before). */
export async function saveClientNotes(db: Db, user: SessionUser, id: string, notes: string): Promise<{ notes: string }> {
  const saved = notes.trim();
  await db.transaction().execute(async (trx) => {
    const before = await replaceClientNotes(trx, user.salonId, id, saved);
    if (before === null) throw notFound('That client');
    await writeAudit(trx, {
      salonId: user.salonId,
      actorUserId: user.id,
      entity: 'client',
      entityId: id,
      action: 'notes_changed',
      before: { notes: before },
      after: { notes: saved },
    });
  });
  return { notes: saved };
}
