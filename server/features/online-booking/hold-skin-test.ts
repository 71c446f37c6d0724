import type { Db } from '../../db/database';
import type { Salon } from '../../../shared/schemas/salon.schemas';
import type { StepPlan } from '../../../shared/schemas/step-plan.schemas';
import { assertSkinTestAllows } from '../skin-tests/skin-test-check.service';
import { sittingStarts } from '../bookings/change-booking.repository';
import type { HoldRow } from './holds.repository';

/**
 * An online hold may become a booking only on a skin test already read negative: online there is no "waiting on a
 * skin test" (the desk decides that). Checked when the client claims the hold and again just before paying, since
 * a reading may have changed in between.
 */
export async function assertHoldSkinTest(db: Db, salon: Salon, hold: HoldRow, clientId: string, now: Date): Promise<void> {
  const starts = await sittingStarts(db, hold.id);
  await assertSkinTestAllows(db, salon, { clientId, plan: hold.step_plan as StepPlan, serviceAsks: hold.needs_skin_test, starts, allowWaiting: false }, now);
}
