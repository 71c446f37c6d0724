import type { Db } from '@server/db/database';
import type { Salon } from '@shared/schemas/salon.schemas';
import { AppError } from '@server/lib/app-error';
import { bookingSkinTestStates } from '../skin-tests';
import { upcomingBookingsOfClient } from './bookings.repository';
import { formatDateTime } from '@shared/format/date-time';
import { formatFor } from '@shared/format/locale';

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
  const live = await upcomingBookingsOfClient(db, clientId, now);
  const states = await bookingSkinTestStates(
    db,
    salon,
    live.map((b) => ({ clientId, status: b.status, plan: b.stepPlan, serviceAsks: b.needsSkinTest, starts: b.starts })),
    now,
  );
  // A live booking has at least one sitting, and there is one state per booking asked about.
  return live.map((b, i) => ({ id: b.id, name: b.serviceName, start: b.starts[0]!, state: states[i]!.status }));
}
