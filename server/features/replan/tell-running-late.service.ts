import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { RunningLateTold } from '@shared/schemas/replan.schemas';
import { formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { AppError, notFound } from '@server/lib/app-error';
import { bookingSnapshot } from '../bookings';
import { sendDueMessages, tellRunningLate, type Senders } from '../messages';
import { replanDaysUnderWay } from '../planning';
import { findSalon } from '../salon';
import { readConflictSittings } from './conflict-sittings.repository';
import { summarise } from './replan-summary.service';

/**
 * The desk's "Tell the client" on a conflict: the later client of sitting `seq` is told the delay the conflict shows
 * now (checked against the day as it runs: another delay, or no conflict any more, answers 409 and tells nobody).
 * Once per sitting and delay, by the database's key; a second ask answers `sent: false` and sends nothing.
 */
export async function tellClientRunningLate(
  db: Kysely<Database>,
  senders: Senders,
  user: SessionUser,
  bookingId: string,
  seq: number,
  minutesLate: number,
  now: Date,
): Promise<RunningLateTold> {
  const salon = await findSalon(db, user.salonId);
  const told = await db.transaction().execute(async (trx) => {
    const booking = await bookingSnapshot(trx, bookingId);
    if (!booking || booking.booking.salonId !== salon.id) throw notFound('That booking');
    const day = await summarise(trx, salon, await replanDaysUnderWay(trx, salon, now));
    const conflict = day.conflicts.find((c) => c.sitting.bookingId === bookingId && c.sitting.seq === seq && c.tellMinutes !== null);
    if (!conflict) throw new AppError('STALE_FIX', 409, `Sitting ${seq} of this booking is not kept waiting by the day as it runs now: nobody was told.`);
    if (conflict.tellMinutes !== minutesLate) {
      throw new AppError(
        'STALE_FIX',
        409,
        `The delay is now about ${conflict.tellMinutes} minutes, not ${minutesLate}: nobody was told. Look at the day again.`,
      );
    }
    const row = (await readConflictSittings(trx, salon.id, [conflict.sitting.sittingId])).get(conflict.sitting.sittingId)!; // named by this re-plan
    const newStart = new Date(row.start.getTime() + minutesLate * 60_000);
    const outcome = await tellRunningLate(
      trx,
      { salon, bookingId, sittingId: row.sittingId, clientId: row.clientId, clientName: row.clientName, minutesLate, newStart, byUserId: user.id },
      now,
    );
    const name = row.clientName || 'The client';
    const at = formatTime(newStart, formatFor(salon.timeZone));
    if (outcome.sent)
      return {
        sent: true,
        words: `Told ${name} by ${outcome.channel === 'sms' ? 'text' : 'e-mail'}: running about ${minutesLate} minutes late — see you at ${at}.`,
      };
    if (outcome.why === 'already_told') return { sent: false, words: `${name} was already told of about ${minutesLate} minutes late.` };
    return { sent: false, words: `${name} cannot be told now (no text or e-mail allowed at this hour): call them.` };
  });
  if (told.sent) void sendDueMessages(db, senders, now, bookingId).catch(() => undefined);
  return told;
}
