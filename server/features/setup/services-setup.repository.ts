import { sql } from 'kysely';
import type { Db } from '@server/db/database';
import type { ServiceInput, SetupService } from '@shared/schemas/setup.schemas';
import { toSummary } from '../services';

/** Every service of the salon, retired ones too, with how many live bookings are still to come. */
export async function listSetupServices(db: Db, salonId: string, now: Date): Promise<SetupService[]> {
  const rows = await db
    .selectFrom('services as s')
    .selectAll('s')
    .select((eb) =>
      eb
        .selectFrom('bookings as b')
        .select(sql<number>`count(distinct b.id)::int`.as('n'))
        .innerJoin('sittings as si', 'si.booking_id', 'b.id')
        .whereRef('b.service_id', '=', 's.id')
        .where('b.status', 'in', ['held', 'booked', 'checked_in'])
        .where('si.live', '=', true)
        .where(sql<boolean>`upper(si.during) > ${now}`)
        .as('futureBookings'),
    )
    .where('s.salon_id', '=', salonId)
    .orderBy('s.active', 'desc')
    .orderBy('s.name')
    .execute();
  return rows.map((r) => ({
    ...toSummary(r),
    depositPercent: r.deposit_percent === null ? null : Number(r.deposit_percent),
    active: r.active,
    futureBookings: r.futureBookings ?? 0,
  }));
}

const columns = (s: ServiceInput) => ({
  name: s.name,
  description: s.description,
  category: s.category,
  skill: s.skill,
  price_cents: s.priceCents,
  price_is_from: s.priceIsFrom,
  online_bookable: s.onlineBookable,
  needs_skin_test: s.needsSkinTest,
  deposit_cents: s.depositKind === 'fixed' ? s.depositCents : 0,
  deposit_percent: s.depositKind === 'percent' ? s.depositPercent : null,
  step_plan: JSON.stringify(s.stepPlan),
});

export async function insertService(db: Db, salonId: string, s: ServiceInput): Promise<string> {
  const row = await db
    .insertInto('services')
    .values({ salon_id: salonId, ...columns(s) })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** Bookings keep the step plan, price and deposit copied when they were made, so only the menu changes. */
export async function updateService(db: Db, salonId: string, id: string, s: ServiceInput): Promise<boolean> {
  const result = await db.updateTable('services').set(columns(s)).where('id', '=', id).where('salon_id', '=', salonId).executeTakeFirst();
  return result.numUpdatedRows > 0n;
}

/** Takes a service off the menu; the row stays, since bookings, offers and standby entries refer to it. */
export async function retireService(db: Db, salonId: string, id: string): Promise<boolean> {
  const r = await db.updateTable('services').set({ active: false }).where('id', '=', id).where('salon_id', '=', salonId).executeTakeFirst();
  return r.numUpdatedRows > 0n;
}

/** Skills named by the salon's services and staff, for pick lists. */
export async function listSkills(db: Db, salonId: string): Promise<string[]> {
  const [services, staff] = await Promise.all([
    db.selectFrom('services').select('skill').where('salon_id', '=', salonId).execute(),
    db.selectFrom('staff').select('skills').where('salon_id', '=', salonId).execute(),
  ]);
  return [...new Set([...services.map((s) => s.skill), ...staff.flatMap((s) => s.skills)])].sort();
}
