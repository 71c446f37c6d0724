import { sql } from 'kysely';
import { DateTime } from 'luxon';
import type { Db } from '../../db/database';
import type { Salon } from '../../../shared/schemas/salon.schemas';
import type { StepPlan } from '../../../shared/schemas/step-plan.schemas';
import { AppError } from '../../lib/app-error';
import { assertSkinTestAllows } from '../skin-tests/skin-test-check.service';

/**
 * After a change to a client's skin tests (a skin-test appointment cancelled), every live booking of theirs whose
 * steps need a test must still satisfy the skin-test rule; otherwise the change is refused with the bookings named.
 */
export async function assertColourBookingsStillAllowed(db: Db, salon: Salon, clientId: string, now: Date): Promise<void> {
  const live = await db
    .selectFrom('bookings as b')
    .innerJoin('services as s', 's.id', 'b.service_id')
    .select(['b.id', 's.name', 's.needs_skin_test', 'b.step_plan', sql<Date[]>`array(select lower(si.during) from sittings si where si.booking_id = b.id order by si.seq)`.as('starts')])
    .where('b.client_id', '=', clientId)
    .where('b.status', 'in', ['held', 'booked'])
    .where(sql<boolean>`exists (select 1 from sittings si where si.booking_id = b.id and lower(si.during) > ${now})`)
    .execute();
  const blocked: { name: string; start: Date }[] = [];
  for (const b of live) {
    try {
      await assertSkinTestAllows(db, salon, { clientId, plan: b.step_plan as StepPlan, serviceAsks: b.needs_skin_test, starts: b.starts, allowWaiting: true }, now);
    } catch (e) {
      if (!(e instanceof AppError)) throw e;
      blocked.push({ name: b.name, start: b.starts[0] });
    }
  }
  if (blocked.length) {
    const list = blocked.map((b) => `${b.name} on ${DateTime.fromJSDate(b.start, { zone: salon.timeZone }).toFormat('ccc d LLL, h:mm a')}`).join('; ');
    throw new AppError('SKIN_TEST', 409, `These colour bookings rely on this skin test: ${list}. Move or cancel them first.`);
  }
}
