import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import { moneyMoved } from '../payments';

/** One money movement of a salon day as the takings read it. */
export interface DayMovement {
  at: Date;
  kind: 'deposit' | 'balance' | 'tip' | 'refund';
  method: 'card' | 'cash';
  amountCents: number;
  /** A refund's payment: what kind of money went back. */
  ofKind: 'deposit' | 'balance' | 'tip' | 'refund' | null;
  /** A tip's stylist; for a refund of a tip, the stylist of the tip it returns. */
  staffId: string | null;
  stylistName: string | null;
  clientName: string | null;
  note: string;
}

/**
 * The day's movements: payments taken (succeeded) and refunds decided (made, or pending at the provider), by when
 * they were recorded. A declined or failed row moved nothing.
 */
export async function dayMovements(db: Db, salonId: string, from: Date, to: Date): Promise<DayMovement[]> {
  return (
    db
      .selectFrom('payments as p')
      .leftJoin('payments as of', 'of.id', 'p.refund_of')
      // A refund of a tip names no stylist itself: the tip it returns does.
      .leftJoin('staff as s', (j) => j.on(sql<boolean>`s.id = coalesce(p.staff_id, of.staff_id)`))
      .leftJoin('clients as c', 'c.id', 'p.client_id')
      .select([
        'p.created_at as at',
        'p.kind',
        'p.method',
        'p.amount_cents as amountCents',
        'of.kind as ofKind',
        sql<string | null>`coalesce(p.staff_id, of.staff_id)`.as('staffId'),
        's.display_name as stylistName',
        'c.name as clientName',
        'p.message as note',
      ])
      .where('p.salon_id', '=', salonId)
      .where('p.created_at', '>=', from)
      .where('p.created_at', '<', to)
      .where(moneyMoved)
      .orderBy('p.created_at')
      .execute()
  );
}

/** Deposits set against the bill at the checkouts paid that day. */
export async function depositsApplied(db: Db, salonId: string, from: Date, to: Date): Promise<number> {
  const row = await db
    .selectFrom('checkouts')
    .select(sql<string>`coalesce(sum(deposit_applied_cents), 0)`.as('sum'))
    .where('salon_id', '=', salonId)
    .where('status', '=', 'paid')
    .where('paid_at', '>=', from)
    .where('paid_at', '<', to)
    .executeTakeFirstOrThrow();
  return Number(row.sum);
}

/** Every close of a salon day, the standing one (not reopened) first, then the reopened ones newest first. */
export async function closesOf(db: Db, salonId: string, day: string) {
  return db
    .selectFrom('day_closes as d')
    .leftJoin('users as c', 'c.id', 'd.closed_by')
    .leftJoin('users as r', 'r.id', 'd.reopened_by')
    .select([
      'd.id',
      'd.expected_cash_cents as expectedCashCents',
      'd.counted_cash_cents as countedCashCents',
      'd.difference_cents as differenceCents',
      'd.note',
      'c.name as closedBy',
      'd.closed_at as closedAt',
      'r.name as reopenedBy',
      'd.reopened_at as reopenedAt',
    ])
    .where('d.salon_id', '=', salonId)
    .where('d.day', '=', sql<Date>`${day}::date`)
    .orderBy(sql`d.reopened_at is null`, 'desc')
    .orderBy('d.closed_at', 'desc')
    .execute();
}

/** The day's close; the unique index `day_closes_one_standing` refuses a second while one stands. */
export async function insertClose(
  db: Db,
  c: { salonId: string; day: string; currency: string; totals: unknown; expectedCashCents: number; countedCashCents: number; note: string; closedBy: string },
): Promise<void> {
  await db
    .insertInto('day_closes')
    .values({
      salon_id: c.salonId,
      day: c.day,
      currency: c.currency,
      totals: JSON.stringify(c.totals),
      expected_cash_cents: c.expectedCashCents,
      counted_cash_cents: c.countedCashCents,
      note: c.note,
      closed_by: c.closedBy,
    })
    .execute();
}

/** Reopens the standing close of the day; false when the day is not closed. */
export async function reopenClose(db: Db, salonId: string, day: string, by: string, at: Date): Promise<boolean> {
  const res = await db
    .updateTable('day_closes')
    .set({ reopened_by: by, reopened_at: at })
    .where('salon_id', '=', salonId)
    .where('day', '=', sql<Date>`${day}::date`)
    .where('reopened_at', 'is', null)
    .executeTakeFirst();
  return Number(res.numUpdatedRows) === 1;
}
