import type { Db } from '@server/db/database';
import type { Salon } from '@shared/schemas/salon.schemas';
import { AppError } from '@server/lib/app-error';
import { assertSkinTestAllows } from '../skin-tests';
import type { SittingForTap } from './sitting-run.repository';

/**
 * The skin-test rule once more when the client is in the salon (arrival, and the sitting's first step): the booking
 * may have rested on an unread test, or the record changed since. Only this sitting's own steps count. The desk's
 * door (a guardian's consent on record counts), but "waiting" is not enough now: the colour is about to go on.
 */
export async function assertColourMayStart(db: Db, salon: Salon, found: SittingForTap, now: Date): Promise<void> {
  const { booking, sitting } = found;
  const own = booking.stepPlan.sittings[sitting.seq - 1];
  if (!booking.clientId || !own) return;
  const why = (reason: string) => `Sitting ${sitting.seq} cannot start: ${reason}`;
  try {
    const footing = await assertSkinTestAllows(
      db,
      salon,
      { clientId: booking.clientId, plan: { sittings: [own] }, serviceAsks: booking.serviceAsks, starts: [sitting.start], atDesk: true },
      now,
    );
    if (footing === 'waiting') {
      throw new AppError(
        'SKIN_TEST',
        409,
        why(
          "the client's skin test has not been read yet, and this colour needs a test read negative first. Record the reading on the client card, or change the steps to colour without a skin test.",
        ),
      );
    }
  } catch (err) {
    if (err instanceof AppError && err.code === 'SKIN_TEST' && !err.message.startsWith('Sitting ')) throw new AppError('SKIN_TEST', 409, why(err.message));
    throw err;
  }
}
