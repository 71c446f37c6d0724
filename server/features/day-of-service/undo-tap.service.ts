import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { SittingRun, TapAction } from '@shared/schemas/day-of-service.schemas';
import { formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { UNDO_MS } from '@shared/rules/sitting-status';
import { AppError } from '@server/lib/app-error';
import { latestTap, markTapUndone, setSittingState, setStepActuals } from './sitting-run.repository';
import { assertMayTap, runTap } from './sitting-tap.service';

const tapWords: Record<TapAction, (step: number | null) => string> = {
  arrive: () => 'the arrival',
  no_show: () => 'the no-show',
  start: (k) => `the start of step ${k}`,
  finish: (k) => `the finish of step ${k}`,
  finish_sitting: () => 'finishing the sitting',
};

/**
 * Puts the sitting back as it was before its last tap, within a minute of the tap: the sitting's status and arrival,
 * every step's actual times, and so the booking's status. Only the last tap, once. A no-show is never undone: a no-show
 * sitting refuses every tap (runTap), as its message has gone to the client and its time may be booked again. Whoever
 * may make a tap may undo it.
 */
export function undoLastTap(db: Kysely<Database>, user: SessionUser, bookingId: string, seq: number, now: Date): Promise<SittingRun> {
  return runTap(db, { user, bookingId, seq, door: 'stylist_or_desk' }, now, async (trx: Db, salon, found) => {
    const tap = await latestTap(trx, found.sitting.id);
    if (!tap || tap.undoneAt) throw new AppError('CONFLICT', 409, `There is no tap on sitting ${seq} to undo.`);
    const what = tapWords[tap.action](tap.stepSeq);
    if (tap.action === 'arrive') await assertMayTap(trx, user, found, 'desk');
    if (now.getTime() - tap.at.getTime() > UNDO_MS) {
      const at = formatTime(tap.at, formatFor(salon.timeZone));
      throw new AppError('CONFLICT', 409, `The last tap (${what}, at ${at}) was more than a minute ago: it can no longer be undone.`);
    }
    await setSittingState(trx, found.sitting.id, tap.before.sitting);
    for (const step of tap.before.steps) await setStepActuals(trx, step);
    await markTapUndone(trx, tap.id, now);
    return { action: 'undo', stepSeq: tap.stepSeq, audit: `undid ${what} of sitting ${seq}` };
  });
}
