import type { z } from 'zod';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type { BookingHistorySchema } from '@shared/schemas/booking.schemas';
import type { BookingView, MyBookings } from '@shared/schemas/booking-view.schemas';
import { BookingStatusSchema } from '@shared/schemas/common.schemas';
import type { Db } from '@server/db/database';
import { notFound } from '@server/lib/app-error';
import { listAudit } from '../audit';
import { findClientIdForUser } from '../clients';
import { findSalon } from '../salon';
import { loadBookingViews } from './booking-views.service';
import { findStaffIdForUser } from './salon-resources.repository';

/** No record has this id: a scope for a caller with no client or staff record, which therefore sees nothing. */
const NOBODY = '00000000-0000-0000-0000-000000000000';

/** One booking as the desk sees it (any status): what every write to a booking answers with. */
export async function deskBookingView(db: Db, salonId: string, timeZone: string, bookingId: string): Promise<BookingView> {
  const [view] = await loadBookingViews(db, { salonId, bookingId, statuses: BookingStatusSchema.options }, timeZone);
  if (!view) throw notFound('That booking');
  return view;
}

/**
 * One booking for whoever asks: staff of its salon, a stylist only the ones they work on, a client only their own.
 * Anything else is answered exactly like a booking that does not exist, so ids cannot be probed.
 */
export async function visibleBooking(db: Db, user: SessionUser, bookingId: string): Promise<BookingView> {
  const salon = await findSalon(db, user.salonId);
  const scope =
    user.role === 'client'
      ? { clientId: (await findClientIdForUser(db, user.id)) ?? NOBODY }
      : user.role === 'stylist'
        ? { stylistId: (await findStaffIdForUser(db, user.id)) ?? NOBODY }
        : {};
  const [booking] = await loadBookingViews(db, { salonId: salon.id, bookingId, statuses: BookingStatusSchema.options, ...scope }, salon.timeZone);
  if (!booking) throw notFound('That booking');
  return booking;
}

/** The signed-in client's bookings, every status, in the salon's zone. */
export async function myBookings(db: Db, user: SessionUser): Promise<MyBookings> {
  const salon = await findSalon(db, user.salonId);
  const clientId = await findClientIdForUser(db, user.id);
  const bookings = clientId ? await loadBookingViews(db, { salonId: salon.id, clientId, statuses: BookingStatusSchema.options }, salon.timeZone) : [];
  return { timeZone: salon.timeZone, bookings };
}

/** A booking's audit entries, oldest first: who, when, what, before and after. */
export async function bookingHistory(db: Db, user: SessionUser, bookingId: string): Promise<z.infer<typeof BookingHistorySchema>> {
  const entries = await listAudit(db, user.salonId, 'booking', bookingId);
  if (!entries.length) await deskBookingView(db, user.salonId, 'UTC', bookingId); // 404 for unknown ids
  return { entries: entries.map((e) => ({ at: e.at.toISOString(), actor: e.actor, action: e.action, before: e.before ?? null, after: e.after ?? null })) };
}
