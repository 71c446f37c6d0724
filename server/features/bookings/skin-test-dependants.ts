import { sql } from 'kysely';
import type { Db } from '../../db/database';
import type { Salon } from '../../../shared/schemas/salon.schemas';
import type { StepPlan } from '../../../shared/schemas/step-plan.schemas';
import { AppError } from '../../lib/app-error';
import { bookingSkinTestStates } from '../skin-tests/skin-test-check.service';
import { formatDateTime } from '../../../shared/format/date-time';
import { formatFor } from '../../../shared/format/locale';

/**
 * A change to a client's skin tests (a skin-test appointment cancelled) must not take away the footing of a live
 * colour booking that had one: `change` runs, and if any booking the rule allowed before is no longer allowed after,
 * the whole change is refused with those bookings named. Bookings already blocked (a reaction recorded) stay
 * cancellable: they are the desk's to clear.
 */
export async function withColourBookingsKept(db: Db, salon: Salon, clientId: string, now: Date, change: () => Promise<void>): Promise<void> {
  const before = await liveStates(db, salon, clientId, now);
  await change();
  const after = await liveStates(db, salon, clientId, now);
  const lost = after.filter((b) => b.state === 'blocked' && before.find((x) => x.id === b.id)?.state !== 'blocked');
  if (lost.length) {
    const list = lost.map((b) => `${b.name} on ${formatDateTime(b.start, formatFor(salon.timeZone), { width: 'short', year: false })}`).join('; ');
    throw new AppError('SKIN_TEST', 409, `These colour bookings rely on this skin test: ${list}. Move or cancel them first.`);
  }
}

async function liveStates(db: Db, salon: Salon, clientId: string, now: Date) {
  const live = await db
    .selectFrom('bookings as b')
    .innerJoin('services as s', 's.id', 'b.service_id')
    .select(['b.id', 'b.status', 's.name', 's.needs_skin_test', 'b.step_plan', sql<Date[]>`array(select lower(si.during) from sittings si where si.booking_id = b.id order by si.seq)`.as('starts')])
    .where('b.client_id', '=', clientId)
    .where('b.status', 'in', ['held', 'booked'])
    .where(sql<boolean>`exists (select 1 from sittings si where si.booking_id = b.id and lower(si.during) > ${now})`)
    .execute();
  const states = await bookingSkinTestStates(db, salon, live.map((b) => ({ clientId, status: b.status, plan: b.step_plan as StepPlan, serviceAsks: b.needs_skin_test, starts: b.starts })), now);
  return live.map((b, i) => ({ id: b.id, name: b.name, start: b.starts[0], state: states[i].status }));
}
