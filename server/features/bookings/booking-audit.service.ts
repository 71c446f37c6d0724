import type { Db } from '@server/db/database';
import { writeAudit } from '../audit';
import { bookingSnapshot } from './booking-snapshot.repository';

export interface BookingChange {
  salonId: string;
  actorUserId: string | null;
  bookingId: string;
  action: string;
  /** The booking as recorded before the change (none for a new booking). */
  before?: unknown;
  /** What the entry keeps beside the booking as it is now (a changed plan's steps). */
  alsoAfter?: Record<string, unknown>;
}

/**
 * The entry every write to a booking leaves in the audit log, inside the write's transaction: who, what, and the
 * booking as recorded before and after (status, stylist, each sitting's chair and times), so its history reads alike.
 */
export async function auditBookingChange(db: Db, change: BookingChange): Promise<void> {
  const after = (await bookingSnapshot(db, change.bookingId))?.audit;
  await writeAudit(db, {
    salonId: change.salonId,
    actorUserId: change.actorUserId,
    entity: 'booking',
    entityId: change.bookingId,
    action: change.action,
    before: change.before,
    after: change.alsoAfter ? { ...after, ...change.alsoAfter } : after,
  });
}
