import type { Insertable } from 'kysely';
import type { Db } from '../../db/database';
import type { MessagesTable } from '../../db/schema';
import { bookingForMessages, dropQueued, type BookingForMessages } from './messages.repository';
import { outOfQuietHours, reminderAt } from './quiet-hours';
import { bookingMessage, reminderMessage, type BookingMessageKind, type MessageText } from './templates';

/** Why the booking's messages are being planned again. */
export type BookingChange = 'booked' | 'moved' | 'cancelled';

const PLANNED_FOR = ['booked', 'checked_in', 'cancelled'];

/**
 * Brings a booking's send log in line with the booking, inside the caller's transaction: a move bumps the
 * booking's version and drops what was queued for the old times; a cancellation drops everything queued.
 * New rows carry the version in their dedupe key, so planning twice inserts nothing twice. The rows are the
 * schedule: the send job picks each one up once its send_at has come (see send-message.job.ts).
 */
export async function replanBookingMessages(db: Db, bookingId: string, now: Date, change: BookingChange = 'booked'): Promise<void> {
  if (change === 'moved') await db.updateTable('bookings').set((eb) => ({ version: eb('version', '+', 1) })).where('id', '=', bookingId).execute();
  const b = await bookingForMessages(db, bookingId);
  if (!b) return;
  const cancelled = b.status === 'cancelled';
  await dropQueued(db, bookingId, b.version, cancelled);
  // A hold has no client yet and no-shows or finished bookings need nothing new.
  if (!b.clientId || !PLANNED_FOR.includes(b.status) || b.context.sittings.length === 0) return;

  const kind: BookingMessageKind = cancelled ? 'cancellation' : change === 'moved' ? 'change' : 'confirmation';
  const rows = toRows(b, 0, kind, bookingMessage(kind, b.context), now, null);
  if (!cancelled) {
    for (const sitting of b.context.sittings) {
      if (sitting.start <= now) continue;
      for (const hours of b.offsets) {
        const at = reminderAt(sitting.start, hours, b.context.timeZone);
        if (at <= now) continue; // booked too late for this reminder: the confirmation covers it
        rows.push(...toRows(b, sitting.seq, `reminder_${hours}h`, reminderMessage(b.context, sitting.seq, hours), at, sitting.start));
      }
    }
  }
  if (rows.length > 0) await db.insertInto('messages').values(rows).onConflict((oc) => oc.column('dedupe_key').doNothing()).execute();
}

/** One row per channel the client can be reached on; SMS leaves quiet hours, and never after the sitting. */
function toRows(b: BookingForMessages, seq: number, kind: string, text: MessageText, at: Date, notAfter: Date | null): Insertable<MessagesTable>[] {
  const base = { salon_id: b.salonId, booking_id: b.context.bookingId, booking_version: b.version, client_id: b.clientId, kind };
  const key = (channel: string) => `${b.context.bookingId}:${seq}:${kind}:${channel}:v${b.version}`;
  const rows: Insertable<MessagesTable>[] = [];
  if (b.email) {
    rows.push({ ...base, channel: 'email', to_address: b.email, subject: text.subject, body: text.email, attachments: JSON.stringify(text.attachments), send_at: at, dedupe_key: key('email') });
  }
  if (b.phone) {
    const smsAt = outOfQuietHours(at, b.context.timeZone, b.quietFrom, b.quietTo);
    if (!notAfter || smsAt < notAfter) rows.push({ ...base, channel: 'sms', to_address: b.phone, body: text.sms, send_at: smsAt, dedupe_key: key('sms') });
  }
  return rows;
}
