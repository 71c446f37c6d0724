import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { BookingStatus } from '@shared/schemas/common.schemas';

/** A booking as its deposit's money reads it. */
export interface BookingForMoney {
  id: string;
  salonId: string;
  clientId: string | null;
  status: BookingStatus;
  depositCents: number;
  depositOutcome: 'kept' | 'refunded' | null;
}

/**
 * The booking, locked until the transaction ends: a payment through the webhook, a deposit taken at the desk and a
 * request sent are settled one at a time against it. Undefined once it is gone (a hold that lapsed).
 */
export async function lockBookingForMoney(db: Db, bookingId: string): Promise<BookingForMoney | undefined> {
  return db
    .selectFrom('bookings')
    .select(['id', 'salon_id as salonId', 'client_id as clientId', 'status', 'deposit_cents as depositCents', 'deposit_outcome as depositOutcome'])
    .where('id', '=', bookingId)
    .forUpdate()
    .executeTakeFirst();
}

/** Booked desk bookings whose deposit is still not (fully) paid at their release time. */
export async function bookingsPastDepositDue(db: Db, now: Date, limit = 50): Promise<{ id: string; salonId: string; dueBy: Date }[]> {
  const rows = await db
    .selectFrom('bookings as b')
    .select(['b.id', 'b.salon_id as salonId', 'b.deposit_due_by as dueBy'])
    .where('b.status', '=', 'booked')
    .where('b.deposit_due_by', '<=', now)
    .where(
      'b.deposit_cents',
      '>',
      sql<number>`(select coalesce(sum(case when p.kind = 'refund' then -p.amount_cents else p.amount_cents end), 0)
        from payments p left join payments d on d.id = p.refund_of
        where p.booking_id = b.id and p.status in ('pending', 'succeeded') and (p.kind = 'deposit' or d.kind = 'deposit'))`,
    )
    .orderBy('b.deposit_due_by')
    .limit(limit)
    .execute();
  return rows.map((r) => ({ id: r.id, salonId: r.salonId, dueBy: r.dueBy! }));
}
