import { sql } from 'kysely';
import type { Db } from '@server/db/database';

/** A sitting a conflict names, with what the desk reads it by. */
export interface ConflictSittingRow {
  sittingId: string;
  seq: number;
  bookingId: string;
  bookingStatus: string;
  clientId: string | null;
  /** Empty for an online hold (no client yet). */
  clientName: string;
  stylistId: string;
  stylistName: string;
  chairId: string;
  /** As booked. */
  start: Date;
}

/** The salon's sittings by id (another salon's are not found). */
export async function readConflictSittings(db: Db, salonId: string, sittingIds: string[]): Promise<Map<string, ConflictSittingRow>> {
  if (sittingIds.length === 0) return new Map();
  const rows = await db
    .selectFrom('sittings as si')
    .innerJoin('bookings as b', 'b.id', 'si.booking_id')
    .innerJoin('staff as st', 'st.id', 'b.stylist_id')
    .leftJoin('clients as c', 'c.id', 'b.client_id')
    .select([
      'si.id',
      'si.seq',
      'b.id as bookingId',
      'b.status',
      'b.client_id',
      'c.name as clientName',
      'b.stylist_id',
      'st.display_name',
      'si.chair_id',
      sql<Date>`lower(si.during)`.as('start'),
    ])
    .where('b.salon_id', '=', salonId)
    .where('si.id', 'in', [...new Set(sittingIds)])
    .execute();
  return new Map(
    rows.map((r) => [
      r.id,
      {
        sittingId: r.id,
        seq: r.seq,
        bookingId: r.bookingId,
        bookingStatus: r.status,
        clientId: r.client_id,
        clientName: r.clientName ?? '',
        stylistId: r.stylist_id,
        stylistName: r.display_name,
        chairId: r.chair_id,
        start: r.start,
      },
    ]),
  );
}
