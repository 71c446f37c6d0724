import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { CreateStandby, StandbyEntry } from '@shared/schemas/standby.schemas';
import { AppError, notFound } from '@server/lib/app-error';
import { findClient } from '../clients';
import { listServices } from '../services';
import { listStylists } from '../bookings';
import { writeAudit } from '../audit';
import { closeStandby, insertStandby, listStandby } from './standby.repository';

/** The salon's open standby entries. */
export async function standbyList(db: Db, user: SessionUser): Promise<{ entries: StandbyEntry[] }> {
  return { entries: await listStandby(db, user.salonId) };
}

/** Adds a client to the standby list, audited; answers the stored entry. */
export async function addStandby(db: Db, user: SessionUser, body: CreateStandby): Promise<StandbyEntry> {
  // Every id must belong to this salon; a foreign id is answered as a field error, not stored.
  const [client, services, stylists] = await Promise.all([
    findClient(db, user.salonId, body.clientId),
    listServices(db, user.salonId),
    listStylists(db, user.salonId),
  ]);
  const fields: Record<string, string> = {};
  if (!client) fields.clientId = 'No such client in this salon.';
  if (body.serviceIds.some((id) => !services.some((s) => s.id === id))) fields.serviceIds = 'Pick services of this salon.';
  if (body.stylistId && !stylists.some((s) => s.id === body.stylistId)) fields.stylistId = 'No such stylist in this salon.';
  if (Object.keys(fields).length) throw new AppError('VALIDATION_FAILED', 400, 'Some fields need attention.', fields);
  const id = await insertStandby(db, user.salonId, { ...body, notes: body.notes ?? '' }, user.id);
  await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: 'standby_entry', entityId: id, action: 'added', after: body });
  return (await listStandby(db, user.salonId, id))[0]!; // the entry just written
}

/** Takes a client off the standby list, audited; an entry already closed or of another salon is not found. */
export async function removeStandby(db: Db, user: SessionUser, id: string): Promise<void> {
  if (!(await closeStandby(db, user.salonId, id))) throw notFound('That standby entry');
  await writeAudit(db, { salonId: user.salonId, actorUserId: user.id, entity: 'standby_entry', entityId: id, action: 'removed' });
}
