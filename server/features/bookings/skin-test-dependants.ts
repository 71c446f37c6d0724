import { sql } from 'kysely';
import { DateTime } from 'luxon';
import type { Db } from '../../db/database';
import type { Salon } from '../../../shared/schemas/salon.schemas';
import { checkSkinTest } from '../../../shared/rules/skin-test-rule';
import { AppError } from '../../lib/app-error';
import { skinTestRecords } from '../skin-tests/skin-tests.repository';

/**
 * After a change to a client's skin tests (a skin-test appointment cancelled), every live colour booking of
 * theirs must still satisfy the skin-test rule; otherwise the change is refused with the bookings named.
 */
export async function assertColourBookingsStillAllowed(db: Db, salon: Salon, clientId: string, now: Date): Promise<void> {
  const colour = await db
    .selectFrom('bookings as b')
    .innerJoin('services as s', 's.id', 'b.service_id')
    .innerJoin('sittings as si', (j) => j.onRef('si.booking_id', '=', 'b.id').on('si.seq', '=', 1))
    .select(['s.name', sql<Date>`lower(si.during)`.as('start')])
    .where('b.client_id', '=', clientId)
    .where('s.needs_skin_test', '=', true)
    .where('b.status', 'in', ['held', 'booked'])
    .where(sql<boolean>`lower(si.during) > ${now}`)
    .execute();
  if (!colour.length) return;
  const records = await skinTestRecords(db, clientId);
  const policy = { leadHours: salon.skinTestLeadHours, validityDays: salon.skinTestValidityDays };
  const blocked = colour.filter((c) => {
    const v = checkSkinTest(true, records, policy, now);
    return !v.ok || (v.earliestAllowed && c.start < v.earliestAllowed) || (v.latestAllowed && c.start > v.latestAllowed);
  });
  if (blocked.length) {
    const list = blocked.map((b) => `${b.name} on ${DateTime.fromJSDate(b.start, { zone: salon.timeZone }).toFormat('ccc d LLL, h:mm a')}`).join('; ');
    throw new AppError('SKIN_TEST', 409, `These colour bookings rely on this skin test: ${list}. Move or cancel them first.`);
  }
}
