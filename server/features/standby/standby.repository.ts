import type { Db } from '@server/db/database';
import type { CreateStandby, StandbyEntry } from '@shared/schemas/standby.schemas';
import { AvailabilitySchema } from '@shared/schemas/standby.schemas';

export async function insertStandby(db: Db, salonId: string, entry: Required<CreateStandby>, createdBy: string): Promise<string> {
  const row = await db
    .insertInto('standby_entries')
    .values({
      salon_id: salonId,
      client_id: entry.clientId,
      service_ids: entry.serviceIds,
      stylist_id: entry.stylistId,
      availability: JSON.stringify(entry.availability),
      notes: entry.notes,
      created_by: createdBy,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** Active entries of a salon (or one entry), with client, services and stylist names. */
export async function listStandby(db: Db, salonId: string, id?: string): Promise<StandbyEntry[]> {
  let query = db
    .selectFrom('standby_entries as e')
    .innerJoin('clients as c', 'c.id', 'e.client_id')
    .leftJoin('staff as st', 'st.id', 'e.stylist_id')
    .select([
      'e.id',
      'e.service_ids',
      'e.availability',
      'e.notes',
      'e.created_at',
      'c.id as clientId',
      'c.name as clientName',
      'c.phone',
      'c.email',
      'st.id as stylistId',
      'st.display_name as stylistName',
    ])
    .where('e.salon_id', '=', salonId)
    .where('e.active', '=', true)
    .orderBy('e.created_at');
  if (id) query = query.where('e.id', '=', id);
  const [rows, services] = await Promise.all([query.execute(), db.selectFrom('services').select(['id', 'name']).where('salon_id', '=', salonId).execute()]);
  return rows.map((r) => ({
    id: r.id,
    client: { id: r.clientId, name: r.clientName, phone: r.phone, email: r.email },
    services: r.service_ids.map((sid) => ({ id: sid, name: services.find((s) => s.id === sid)?.name ?? '' })),
    stylist: r.stylistId ? { id: r.stylistId, name: r.stylistName ?? '' } : null,
    availability: AvailabilitySchema.array().parse(r.availability),
    notes: r.notes,
    createdAt: r.created_at.toISOString(),
  }));
}

/** Closes an entry (removed by the desk, or the client got a time). True when one was open. */
export async function closeStandby(db: Db, salonId: string, id: string): Promise<boolean> {
  const res = await db
    .updateTable('standby_entries')
    .set({ active: false })
    .where('salon_id', '=', salonId)
    .where('id', '=', id)
    .where('active', '=', true)
    .executeTakeFirst();
  return Number(res.numUpdatedRows) > 0;
}
