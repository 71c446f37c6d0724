import type { Db } from '@server/db/database';

export async function insertDepositRequest(
  db: Db,
  r: { salonId: string; bookingId: string; tokenHash: string; channel: 'sms' | 'email'; amountCents: number; requestedBy: string },
): Promise<string> {
  const row = await db
    .insertInto('deposit_requests')
    .values({
      salon_id: r.salonId,
      booking_id: r.bookingId,
      token_hash: r.tokenHash,
      channel: r.channel,
      amount_cents: r.amountCents,
      requested_by: r.requestedBy,
    })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** The booking a request's link is for. */
export async function findDepositRequest(db: Db, tokenHash: string): Promise<{ bookingId: string; salonId: string } | undefined> {
  return db.selectFrom('deposit_requests').select(['booking_id as bookingId', 'salon_id as salonId']).where('token_hash', '=', tokenHash).executeTakeFirst();
}

/** The requests sent for a booking, newest first, with who sent each. */
export async function depositRequestsOf(db: Db, bookingId: string) {
  return db
    .selectFrom('deposit_requests as r')
    .leftJoin('users as u', 'u.id', 'r.requested_by')
    .select(['r.channel', 'r.amount_cents as amountCents', 'r.created_at as at', 'u.name as byName'])
    .where('r.booking_id', '=', bookingId)
    .orderBy('r.created_at', 'desc')
    .execute();
}
