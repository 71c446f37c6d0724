import type { z } from 'zod';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import type {
  BookingOptionsRequest,
  BookingOptionsResponse,
  ChangePlanSchema,
  CreateBooking,
  DeskMoveTimesQuerySchema,
  MoveSittingSchema,
} from '@shared/schemas/booking.schemas';
import type { BookingView } from '@shared/schemas/booking-view.schemas';
import type { Availability, CancelTerms } from '@shared/schemas/online-booking.schemas';
import type { Salon } from '@shared/schemas/salon.schemas';
import type { Kysely } from 'kysely';
import type { Db } from '@server/db/database';
import type { Database } from '@server/db/schema';
import { findSalon } from '../salon';
import { findBookingOptions } from './booking-options.service';
import { deskBookingView } from './booking-view.service';
import { cancelBooking, deskCancelTerms } from './cancel-booking.service';
import { changePlan } from './change-plan.service';
import { createBooking } from './create-booking.service';
import { moveSitting } from './move-booking.service';
import { deskMoveTimes } from './move-times.service';

/*
 * The desk's doors to a booking: each finds the caller's salon, does the one thing, and a write answers with the
 * booking as the desk sees it afterwards (its page and the calendars show that answer at once).
 */

type Writer = Kysely<Database>;

/** Finds the caller's salon, makes the change (which names the booking it wrote) and answers that booking. */
async function changeAtDesk(db: Writer, user: SessionUser, change: (salon: Salon) => Promise<string>): Promise<BookingView> {
  const salon = await findSalon(db, user.salonId);
  return deskBookingView(db, salon.id, salon.timeZone, await change(salon));
}

/** Options for a (possibly edited) service for a client, earliest first, one per stylist and day. */
export async function deskBookingOptions(db: Db, user: SessionUser, body: Required<BookingOptionsRequest>, now: Date): Promise<BookingOptionsResponse> {
  return findBookingOptions(db, await findSalon(db, user.salonId), body, now);
}

/** Books one option (all its sittings), or answers the booking already made with this idempotency key. */
export function bookAtDesk(db: Writer, user: SessionUser, body: CreateBooking, now: Date): Promise<BookingView> {
  return changeAtDesk(db, user, (salon) => createBooking(db, salon, user, body, now));
}

/** Moves one sitting (and, for a booking of one sitting, maybe its stylist); the desk may move one waiting on a skin test. */
export function moveAtDesk(db: Writer, user: SessionUser, bookingId: string, body: z.output<typeof MoveSittingSchema>, now: Date): Promise<BookingView> {
  const move = { bookingId, sitting: body.sitting, start: new Date(body.start), stylistId: body.stylistId, chairId: body.chairId, allowWaitingOnTest: true };
  return changeAtDesk(db, user, (salon) => moveSitting(db, salon, user.id, move, now).then(() => bookingId));
}

/** Replaces the booking's step plan, each sitting kept at its start. */
export function changePlanAtDesk(db: Writer, user: SessionUser, bookingId: string, body: z.output<typeof ChangePlanSchema>, now: Date): Promise<BookingView> {
  return changeAtDesk(db, user, (salon) => changePlan(db, salon, user.id, bookingId, body.stepPlan, now).then(() => bookingId));
}

/** Free starts for one sitting, as the move itself would accept them. */
export async function moveTimesAtDesk(
  db: Db,
  user: SessionUser,
  bookingId: string,
  query: z.output<typeof DeskMoveTimesQuerySchema>,
  now: Date,
): Promise<Availability> {
  const salon = await findSalon(db, user.salonId);
  return deskMoveTimes(db, salon, bookingId, { sitting: Number(query.sitting), stylistId: query.stylistId, from: query.from }, now);
}

/** What cancelling now does to the deposit, in the desk's words. */
export async function cancelTermsAtDesk(db: Db, user: SessionUser, bookingId: string, now: Date): Promise<CancelTerms> {
  return deskCancelTerms(db, await findSalon(db, user.salonId), bookingId, now);
}

/** Cancels with a reason; the deposit policy decides kept or refunded. */
export function cancelAtDesk(db: Writer, user: SessionUser, bookingId: string, reason: string, now: Date): Promise<BookingView> {
  return changeAtDesk(db, user, (salon) => cancelBooking(db, salon, user.id, bookingId, reason, now).then(() => bookingId));
}
