import { sql } from 'kysely';
import type { Db } from '@server/db/database';

export type OfferStatus = 'offered' | 'taken' | 'gone' | 'expired';

/** An offer with what its page and messages show. */
export interface WindowOffer {
  id: string;
  salonId: string;
  standbyEntryId: string;
  clientId: string;
  serviceId: string;
  stylistId: string;
  startsAt: Date;
  status: OfferStatus;
  expiresAt: Date;
  salonName: string;
  timeZone: string;
  serviceName: string;
  stylistName: string;
  clientName: string;
}

/** An offer of a window slot, as an accept sees the slot's others. */
export interface SlotOffer {
  id: string;
  status: OfferStatus;
  clientId: string;
  clientName: string;
}

/** An open offer, with what a withdrawal needs to re-check and tell. */
export interface OpenOffer {
  id: string;
  clientId: string;
  serviceId: string;
  startsAt: Date;
  clientName: string;
  serviceName: string;
  stylistName: string;
}

/** An offer as the window cards list it. */
export interface DayOffer {
  id: string;
  stylistId: string;
  startsAt: Date;
  status: OfferStatus;
  expiresAt: Date;
  clientName: string;
  serviceName: string;
}

export async function insertOffer(
  db: Db,
  o: { salonId: string; standbyEntryId: string; clientId: string; serviceId: string; stylistId: string; startsAt: Date; tokenHash: string; createdBy: string },
): Promise<string> {
  const row = await db
    .insertInto('window_offers')
    .values({
      salon_id: o.salonId,
      standby_entry_id: o.standbyEntryId,
      client_id: o.clientId,
      service_id: o.serviceId,
      stylist_id: o.stylistId,
      starts_at: o.startsAt,
      token_hash: o.tokenHash,
      status: 'offered',
      created_by: o.createdBy,
      expires_at: o.startsAt,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** The offer its link's token names, if any. */
export async function findOffer(db: Db, tokenHash: string): Promise<WindowOffer | undefined> {
  const row = await db
    .selectFrom('window_offers as o')
    .innerJoin('salons as sa', 'sa.id', 'o.salon_id')
    .innerJoin('services as sv', 'sv.id', 'o.service_id')
    .innerJoin('staff as st', 'st.id', 'o.stylist_id')
    .innerJoin('clients as c', 'c.id', 'o.client_id')
    .select([
      'o.id',
      'o.salon_id',
      'o.standby_entry_id',
      'o.client_id',
      'o.service_id',
      'o.stylist_id',
      'o.starts_at',
      'o.status',
      'o.expires_at',
      'sa.name as salonName',
      'sa.time_zone as timeZone',
      'sv.name as serviceName',
      'st.display_name as stylistName',
      'c.name as clientName',
    ])
    .where('o.token_hash', '=', tokenHash)
    .executeTakeFirst();
  return (
    row && {
      id: row.id,
      salonId: row.salon_id,
      standbyEntryId: row.standby_entry_id,
      clientId: row.client_id,
      serviceId: row.service_id,
      stylistId: row.stylist_id,
      startsAt: row.starts_at,
      status: row.status,
      expiresAt: row.expires_at,
      salonName: row.salonName,
      timeZone: row.timeZone,
      serviceName: row.serviceName,
      stylistName: row.stylistName,
      clientName: row.clientName,
    }
  );
}

/** Every offer of the same window slot, locked: one accept at a time decides who gets it. */
export async function lockSlotOffers(db: Db, stylistId: string, startsAt: Date): Promise<SlotOffer[]> {
  const rows = await db
    .selectFrom('window_offers as o')
    .innerJoin('clients as c', 'c.id', 'o.client_id')
    .select(['o.id', 'o.status', 'o.client_id', 'c.name'])
    .where('o.stylist_id', '=', stylistId)
    .where(sql<boolean>`o.starts_at = ${startsAt}`)
    .forUpdate('o')
    .execute();
  return rows.map((r) => ({ id: r.id, status: r.status, clientId: r.client_id, clientName: r.name }));
}

export async function setOfferStatus(db: Db, ids: string[], status: 'taken' | 'gone' | 'expired', bookingId: string | null = null): Promise<void> {
  if (!ids.length) return;
  await db.updateTable('window_offers').set({ status, booking_id: bookingId }).where('id', 'in', ids).execute();
}

/** Open offers of a stylist starting in [from, to), earliest first. */
export async function listOpenOffers(db: Db, stylistId: string, from: Date, to: Date): Promise<OpenOffer[]> {
  const rows = await db
    .selectFrom('window_offers as o')
    .innerJoin('clients as c', 'c.id', 'o.client_id')
    .innerJoin('services as sv', 'sv.id', 'o.service_id')
    .innerJoin('staff as st', 'st.id', 'o.stylist_id')
    .select(['o.id', 'o.client_id', 'o.service_id', 'o.starts_at', 'c.name as clientName', 'sv.name as serviceName', 'st.display_name as stylistName'])
    .where('o.stylist_id', '=', stylistId)
    .where('o.status', '=', 'offered')
    .where('o.starts_at', '>=', from)
    .where('o.starts_at', '<', to)
    .orderBy('o.starts_at')
    .execute();
  return rows.map((r) => ({
    id: r.id,
    clientId: r.client_id,
    serviceId: r.service_id,
    startsAt: r.starts_at,
    clientName: r.clientName,
    serviceName: r.serviceName,
    stylistName: r.stylistName,
  }));
}

/** The salon's offers starting in [from, to), for the window cards. */
export async function listDayOffers(db: Db, salonId: string, from: Date, to: Date): Promise<DayOffer[]> {
  const rows = await db
    .selectFrom('window_offers as o')
    .innerJoin('clients as c', 'c.id', 'o.client_id')
    .innerJoin('services as sv', 'sv.id', 'o.service_id')
    .select(['o.id', 'o.stylist_id', 'o.starts_at', 'o.status', 'o.expires_at', 'c.name as clientName', 'sv.name as serviceName'])
    .where('o.salon_id', '=', salonId)
    .where('o.starts_at', '>=', from)
    .where('o.starts_at', '<', to)
    .orderBy('o.starts_at')
    .orderBy('c.name')
    .execute();
  return rows.map((r) => ({
    id: r.id,
    stylistId: r.stylist_id,
    startsAt: r.starts_at,
    status: r.status,
    expiresAt: r.expires_at,
    clientName: r.clientName,
    serviceName: r.serviceName,
  }));
}
