import type { Db } from '@server/db/database';
import { hashPassword } from '@server/auth/password';
import { DEMO_PASSWORD } from '@server/demo/demo-catalogue';

/** A stylist made in the demo salon for one browser test (a user who can sign in, and a staff row); see removeDemoVisit. */
export async function insertDemoStylist(
  db: Db,
  salonId: string,
  who: { name: string; displayName: string; email: string },
): Promise<{ userId: string; staffId: string }> {
  const user = await db
    .insertInto('users')
    .values({ salon_id: salonId, email: who.email, name: who.name, role: 'stylist', phone: null, password_hash: await hashPassword(DEMO_PASSWORD) })
    .returning('id')
    .executeTakeFirstOrThrow();
  const staff = await db
    .insertInto('staff')
    .values({ salon_id: salonId, user_id: user.id, display_name: who.displayName, skills: ['colour'], max_clients_at_once: 2 })
    .returning('id')
    .executeTakeFirstOrThrow();
  return { userId: user.id, staffId: staff.id };
}

/**
 * Puts the shared demo salon back after a browser test: the test's booking with its money and checkout, the chairs and
 * basins made for it (insertSittingAround), and the stylist made for it.
 */
export async function removeDemoVisit(db: Db, bookingId: string | undefined, made: { userId?: string; staffId?: string }): Promise<void> {
  if (bookingId) {
    const places = await db
      .selectFrom('sittings')
      .innerJoin('booking_steps', 'booking_steps.sitting_id', 'sittings.id')
      .select(['sittings.chair_id', 'booking_steps.basin_id'])
      .where('sittings.booking_id', '=', bookingId)
      .execute();
    // Refunds name the payments they return, so they go first.
    await db.deleteFrom('payments').where('booking_id', '=', bookingId).where('kind', '=', 'refund').execute();
    await db.deleteFrom('payments').where('booking_id', '=', bookingId).execute();
    await db.deleteFrom('checkouts').where('booking_id', '=', bookingId).execute();
    await db.deleteFrom('bookings').where('id', '=', bookingId).execute();
    const chairs = [...new Set(places.map((c) => c.chair_id))];
    if (chairs.length) await db.deleteFrom('chairs').where('id', 'in', chairs).execute();
    const basins = places.map((c) => c.basin_id).filter((b): b is string => b !== null);
    if (basins.length) await db.deleteFrom('basins').where('id', 'in', basins).execute();
  }
  if (made.staffId) await db.deleteFrom('staff').where('id', '=', made.staffId).execute();
  if (made.userId) await db.deleteFrom('users').where('id', '=', made.userId).execute();
}
