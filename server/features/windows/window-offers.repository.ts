import { sql } from 'kysely';
import type { Db } from '../../db/database';

export async function insertOffer(
  db: Db,
  o: { salonId: string; standbyEntryId: string; clientId: string; serviceId: string; stylistId: string; startsAt: Date; tokenHash: string; createdBy: string },
): Promise<string> {
  const row = await db
    .insertInto('window_offers')
    .values({
      salon_id: o.salonId, standby_entry_id: o.standbyEntryId, client_id: o.clientId, service_id: o.serviceId, stylist_id: o.stylistId,
      starts_at: o.startsAt, token_hash: o.tokenHash, status: 'offered', created_by: o.createdBy, expires_at: o.startsAt,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** An offer with what its page and messages show. */
export async function findOffer(db: Db, tokenHash: string) {
  return db
    .selectFrom('window_offers as o')
    .innerJoin('salons as sa', 'sa.id', 'o.salon_id')
    .innerJoin('services as sv', 'sv.id', 'o.service_id')
    .innerJoin('staff as st', 'st.id', 'o.stylist_id')
    .innerJoin('clients as c', 'c.id', 'o.client_id')
    .select([
      'o.id', 'o.salon_id', 'o.standby_entry_id', 'o.client_id', 'o.service_id', 'o.stylist_id', 'o.starts_at', 'o.status', 'o.expires_at',
      'sa.name as salonName', 'sa.time_zone as timeZone', 'sv.name as serviceName', 'st.display_name as stylistName', 'c.name as clientName',
    ])
    .where('o.token_hash', '=', tokenHash)
    .executeTakeFirst();
}

/** Every offer of the same window slot, locked: one accept at a time decides who gets it. */
export function lockSlotOffers(db: Db, stylistId: string, startsAt: Date) {
  return db
    .selectFrom('window_offers as o')
    .innerJoin('clients as c', 'c.id', 'o.client_id')
    .select(['o.id', 'o.status', 'o.client_id', 'c.name', 'c.phone', 'c.email'])
    .where('o.stylist_id', '=', stylistId)
    .where(sql<boolean>`o.starts_at = ${startsAt}`)
    .forUpdate('o')
    .execute();
}

export async function setOfferStatus(db: Db, ids: string[], status: 'taken' | 'gone' | 'expired', bookingId: string | null = null): Promise<void> {
  if (!ids.length) return;
  await db.updateTable('window_offers').set({ status, booking_id: bookingId }).where('id', 'in', ids).execute();
}

/** Open offers of a stylist starting in [from, to), with what a withdrawal needs to re-check and tell. */
export function listOpenOffers(db: Db, stylistId: string, from: Date, to: Date) {
  return db
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
}

/** The salon's offers starting in [from, to), for the window cards. */
export function listDayOffers(db: Db, salonId: string, from: Date, to: Date) {
  return db
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
}
