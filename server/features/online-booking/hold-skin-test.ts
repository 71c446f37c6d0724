import type { Db } from '@server/db/database';
import type { Salon } from '@shared/schemas/salon.schemas';
import { assertSkinTestAllows } from '../skin-tests';
import { sittingStarts } from '../bookings';
import type { HoldRecord } from './holds.repository';
import { planNeedsSkinTest } from '@shared/rules/skin-test-need';
import { AppError } from '@server/lib/app-error';
import { findHairHistory } from '../hair-history';

/**
 * An online hold may become a booking only on a skin test already read negative: online there is no "waiting on a
 * skin test" (the desk decides that). Checked when the client claims the hold and again just before paying, since
 * a reading may have changed in between.
 */
export async function assertHoldSkinTest(db: Db, salon: Salon, hold: HoldRecord, clientId: string, now: Date): Promise<void> {
  const plan = hold.stepPlan;
  // A client who told us they have reacted to hair colour is not booked for tested colour online: the salon
  // advises first, at a consultation (the EU label warns: do not colour if you have ever reacted after colouring).
  if (planNeedsSkinTest(plan, salon.skinTestFamilies, hold.needsSkinTest)) {
    const reaction = (await findHairHistory(db, clientId)).answers?.previousReaction;
    if (reaction?.answer === 'yes') {
      throw new AppError(
        'SKIN_TEST',
        409,
        'You told us you have reacted to hair colour before, so this colour cannot be booked online. Please book a consultation: the salon will advise on what is safe for you.',
      );
    }
  }
  const starts = await sittingStarts(db, hold.id);
  await assertSkinTestAllows(db, salon, { clientId, plan, serviceAsks: hold.needsSkinTest, starts, atDesk: false }, now);
}
