import type { Kysely } from 'kysely';
import type { z } from 'zod';
import type { Database } from '@server/db/schema';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { CloseDayBodySchema, Takings } from '@shared/schemas/takings.schemas';
import { AppError } from '@server/lib/app-error';
import { formatMoney } from '@shared/money/money';
import { writeAudit } from '../audit';
import { localDayBounds, todayIn } from '../bookings';
import { findSalon } from '../salon';
import { takingsFigures } from './takings-figures';
import { closesOf, dayMovements, depositsApplied, insertClose, reopenClose } from './takings.repository';

type Db = Kysely<Database>;

/** A salon day's takings and its close, as the desk and the owner read them. */
export async function takingsFor(db: Db, user: SessionUser, date: string): Promise<Takings> {
  const salon = await findSalon(db, user.salonId);
  const { from, to } = localDayBounds(date, salon.timeZone);
  const [movements, applied, closes] = await Promise.all([
    dayMovements(db, salon.id, from, to),
    depositsApplied(db, salon.id, from, to),
    closesOf(db, salon.id, date),
  ]);
  const close = (c: (typeof closes)[number]) => ({
    expectedCashCents: c.expectedCashCents,
    countedCashCents: c.countedCashCents,
    differenceCents: c.differenceCents,
    note: c.note,
    closedBy: c.closedBy,
    closedAt: c.closedAt.toISOString(),
    reopenedBy: c.reopenedBy,
    reopenedAt: c.reopenedAt?.toISOString() ?? null,
  });
  const standing = closes.find((c) => c.reopenedAt === null);
  return {
    date,
    timeZone: salon.timeZone,
    currency: salon.currency,
    ...takingsFigures(movements, applied),
    movements: movements.map((m) => ({
      at: m.at.toISOString(),
      kind: m.kind,
      method: m.method,
      amountCents: m.kind === 'refund' ? -m.amountCents : m.amountCents,
      clientName: m.clientName,
      stylistName: m.stylistName,
      note: m.note,
    })),
    close: standing ? close(standing) : null,
    reopened: closes.filter((c) => c.reopenedAt !== null).map(close),
  };
}

/**
 * Closes the day: the desk's counted cash against the cash the day's payments say is in the drawer, the difference
 * recorded with the totals as they stand. One close stands per salon day: a second is refused (409) until the owner
 * reopens the first. A day not begun yet cannot be closed.
 */
export async function closeDay(db: Db, user: SessionUser, body: z.output<typeof CloseDayBodySchema>, now: Date): Promise<Takings> {
  const salon = await findSalon(db, user.salonId);
  if (body.date > todayIn(salon.timeZone, now)) throw new AppError('CONFLICT', 409, 'A day can be closed once it has begun.');
  const takings = await takingsFor(db, user, body.date);
  if (takings.close) throw closedAlready();
  const { movements: _movements, close: _close, reopened: _reopened, ...totals } = takings;
  await db.transaction().execute(async (trx) => {
    await insertClose(trx, {
      salonId: salon.id,
      day: body.date,
      currency: salon.currency,
      totals,
      expectedCashCents: takings.expectedCashCents,
      countedCashCents: body.countedCashCents,
      note: body.note,
      closedBy: user.id,
    });
    const difference = body.countedCashCents - takings.expectedCashCents;
    await writeAudit(trx, {
      salonId: salon.id,
      actorUserId: user.id,
      entity: 'salon',
      entityId: salon.id,
      action: `closed ${body.date}: cash counted ${formatMoney(body.countedCashCents, salon.currency)}, expected ${formatMoney(takings.expectedCashCents, salon.currency)}, ${differenceWords(difference, salon.currency)}`,
    });
  });
  return takingsFor(db, user, body.date);
}

/** The owner reopens a closed day (the close is kept, marked reopened), so the desk can count and close it again. */
export async function reopenDay(db: Db, user: SessionUser, date: string, now: Date): Promise<Takings> {
  const salon = await findSalon(db, user.salonId);
  await db.transaction().execute(async (trx) => {
    if (!(await reopenClose(trx, salon.id, date, user.id, now))) throw new AppError('CONFLICT', 409, `${date} is not closed.`);
    await writeAudit(trx, { salonId: salon.id, actorUserId: user.id, entity: 'salon', entityId: salon.id, action: `reopened ${date}` });
  });
  return takingsFor(db, user, date);
}

export const closedAlready = () => new AppError('CONFLICT', 409, 'This day is closed already; the owner can reopen it to close it again.');

function differenceWords(cents: number, currency: string): string {
  if (cents === 0) return 'no difference';
  return cents < 0 ? `${formatMoney(-cents, currency)} short` : `${formatMoney(cents, currency)} over`;
}
