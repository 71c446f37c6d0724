import { DateTime } from 'luxon';
import { sql } from 'kysely';
import type { Db } from '../db/database';
import { replanBookingMessages } from '../features/messages/plan-messages.service';

/**
 * Gives the demo salon a send log that looks lived-in: each booking's messages are planned as they would
 * have been when it was made (3–10 days before its first sitting), a cancelled one is cancelled before its
 * day, and what fell due before now is recorded as sent at its due time. What is still ahead stays queued
 * for the worker, so the Outbox fills up on its own while the demo runs. Some clients prefer e-mail only,
 * one text only, and a few said yes to suggestions (a toner refresh rule after lightening).
 */
export async function planDemoMessages(db: Db, salonId: string, services: { fullLightening: string }, now: Date): Promise<void> {
  await db
    .insertInto('follow_up_rules')
    .values({
      salon_id: salonId,
      service_id: services.fullLightening,
      title: 'Toner refresh',
      body: 'It has been six weeks since your lightening: a toner refresh brings back the tone you left with. Reply or book online.',
      rrule: 'FREQ=WEEKLY;INTERVAL=6;COUNT=1',
    })
    .execute();
  const clients = await db.selectFrom('clients').select('id').where('salon_id', '=', salonId).orderBy('created_at').orderBy('id').execute();
  for (const [i, c] of clients.entries()) {
    const messageChannel = i % 5 === 3 ? 'email' : i === 4 ? 'sms' : 'both';
    await db
      .updateTable('clients')
      .set({ message_channel: messageChannel, marketing_opt_in: i % 3 === 0 })
      .where('id', '=', c.id)
      .execute();
  }
  const bookings = await db
    .selectFrom('bookings as b')
    .innerJoin('sittings as s', (j) => j.onRef('s.booking_id', '=', 'b.id').on('s.seq', '=', 1))
    .select(['b.id', 'b.status', sql<Date>`lower(s.during)`.as('start')])
    .where('b.salon_id', '=', salonId)
    .where('b.client_id', 'is not', null)
    .orderBy(sql`lower(s.during)`)
    .execute();
  for (const [n, b] of bookings.entries()) {
    const madeAt = earliest(
      DateTime.fromJSDate(b.start)
        .minus({ days: 3 + (n % 8), hours: n % 5 })
        .toJSDate(),
      new Date(now.getTime() - 3_600_000),
    );
    // Planning reads the booking as it was then: ahead of its day, still booked.
    if (b.status !== 'booked') await db.updateTable('bookings').set({ status: 'booked' }).where('id', '=', b.id).execute();
    await replanBookingMessages(db, b.id, madeAt);
    if (b.status === 'cancelled') {
      const cancelledAt = earliest(new Date(b.start.getTime() - 2 * 86_400_000), new Date(now.getTime() - 1_800_000));
      await markSentUntil(db, salonId, cancelledAt);
      await db.updateTable('bookings').set({ status: 'cancelled' }).where('id', '=', b.id).execute();
      await replanBookingMessages(db, b.id, cancelledAt, 'cancelled');
    } else if (b.status !== 'booked') {
      await db.updateTable('bookings').set({ status: b.status }).where('id', '=', b.id).execute();
    }
  }
  await markSentUntil(db, salonId, now);
}

const earliest = (a: Date, b: Date) => (a < b ? a : b);

/** Messages due by `until` are recorded as sent at their due time (the demo's past). */
async function markSentUntil(db: Db, salonId: string, until: Date): Promise<void> {
  await db
    .updateTable('messages')
    .set((eb) => ({ status: 'sent', sent_at: eb.ref('send_at'), attempts: 1, provider_ref: sql<string>`'demo-' || left(id::text, 8)` }))
    .where('salon_id', '=', salonId)
    .where('status', '=', 'queued')
    .where('send_at', '<=', until)
    .execute();
}
