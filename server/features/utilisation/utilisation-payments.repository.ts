import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import { moneyMoved } from '../payments';
import type { BookingStatus } from '@shared/schemas/common.schemas';

/** One money movement of the period, with the booking it belongs to (tips left out: they are the stylists'). */
export interface PeriodPayment {
  /** Milliseconds since 1970. */
  at: number;
  kind: 'deposit' | 'balance' | 'refund';
  /** A refund's payment: what kind of money went back. */
  ofKind: 'deposit' | 'balance' | null;
  amountCents: number;
  bookingId: string;
  stylistId: string;
  serviceId: string;
  bookingStatus: BookingStatus;
  depositOutcome: 'kept' | 'refunded' | null;
}

/**
 * The salon's takings in [from, to) as recorded (docs/money.md, "Takings"): payments taken, and refunds made or on
 * their way, by when they were recorded; tips and their refunds left out.
 */
export async function listPeriodPayments(db: Db, salonId: string, from: Date, to: Date): Promise<PeriodPayment[]> {
  const rows = await db
    .selectFrom('payments as p')
    .innerJoin('bookings as b', 'b.id', 'p.booking_id')
    .leftJoin('payments as of', 'of.id', 'p.refund_of')
    .select([
      sql<number>`extract(epoch from p.created_at)::float8 * 1000`.as('at'),
      'p.kind',
      'of.kind as ofKind',
      'p.amount_cents as amountCents',
      'p.booking_id as bookingId',
      'b.stylist_id as stylistId',
      'b.service_id as serviceId',
      'b.status as bookingStatus',
      'b.deposit_outcome as depositOutcome',
    ])
    .where('p.salon_id', '=', salonId)
    .where('p.created_at', '>=', from)
    .where('p.created_at', '<', to)
    .where('p.kind', '<>', 'tip')
    .where((eb) => eb.or([eb('of.kind', 'is', null), eb('of.kind', '<>', 'tip')]))
    .where(moneyMoved)
    .execute();
  return rows as PeriodPayment[];
}
