import type { Kysely } from 'kysely';
import type { Database } from '@server/db/schema';
import type { Db } from '@server/db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { SittingRun } from '@shared/schemas/day-of-service.schemas';
import type { Salon } from '@shared/schemas/salon.schemas';
import { formatDate, formatTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';
import { lateMinutes } from '@shared/rules/sitting-status';
import { localDateOf } from '@shared/time/salon-time';
import { AppError } from '@server/lib/app-error';
import { assertColourMayStart } from './colour-start-check';
import { setSittingState, type SittingForTap } from './sitting-run.repository';
import { runTap } from './sitting-tap.service';

/** A sitting the desk may still mark arrived or a no-show: booked, on its own day. */
export function assertStillBooked(salon: Salon, found: SittingForTap, what: string): void {
  const { sitting } = found;
  const zone = formatFor(salon.timeZone);
  if (sitting.status === 'booked') return;
  const when = sitting.arrivedAt ? ` at ${formatTime(sitting.arrivedAt, zone)}` : '';
  const words = { arrived: `was marked arrived${when}`, in_progress: 'is under way', finished: 'is finished', no_show: 'was marked a no-show' };
  throw new AppError('CONFLICT', 409, `Sitting ${sitting.seq} ${words[sitting.status]}: it cannot be ${what} now.`);
}

/** The client of one sitting is here: the skin-test rule again, then arrived, with the minutes late kept. */
export function arriveSitting(db: Kysely<Database>, user: SessionUser, bookingId: string, seq: number, now: Date): Promise<SittingRun> {
  return runTap(db, { user, bookingId, seq, door: 'desk' }, now, async (trx: Db, salon, found) => {
    assertStillBooked(salon, found, 'marked arrived');
    const day = localDateOf(found.sitting.start, salon.timeZone);
    if (day !== localDateOf(now, salon.timeZone)) {
      throw new AppError(
        'CONFLICT',
        409,
        `Sitting ${seq} is on ${formatDate(found.sitting.start, formatFor(salon.timeZone), { width: 'short' })}: a client is marked arrived on the day.`,
      );
    }
    await assertColourMayStart(trx, salon, found, now);
    const late = lateMinutes(found.sitting.start, now);
    await setSittingState(trx, found.sitting.id, { status: 'arrived', arrivedAt: now, lateMinutes: late, leftOpenReason: null });
    return { action: 'arrive', stepSeq: null, audit: `arrived: sitting ${seq}${late > 0 ? ` (${late} min late)` : ''}` };
  });
}
