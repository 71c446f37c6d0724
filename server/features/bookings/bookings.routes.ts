import { apiPaths } from '../../../shared/api/api-paths';
import { BookingViewSchema, DayQuerySchema, DayViewSchema, MyBookingsSchema, WeekQuerySchema, WeekViewSchema } from '../../../shared/schemas/booking-view.schemas';
import { BookingStatusSchema, IdParamsSchema } from '../../../shared/schemas/common.schemas';
import type { AppDeps } from '../../app-deps';
import type { Db } from '../../db/database';
import { DESK } from '../../auth/require-access';
import { apiRoute } from '../../lib/api-route';
import { notFound } from '../../lib/app-error';
import { findSalon, toSalon } from '../salon/salon.repository';
import { daysFrom, salonAtBookVersion } from '../book-version/book-version.repository';
import { cachedBookRead } from '../book-version/cached-book-read';
import { findClientIdForUser } from '../clients/clients.repository';
import { findStaffIdForUser } from './salon-resources.repository';
import { loadBookingViews } from './booking-views.repository';
import { deskDay, deskWeek, mondayOf, stylistDay, todayIn } from './day-view.service';

/**
 * The salon at its book version over `count` dates from `date` (moved to the start of its period by
 * `start`, e.g. the week's Monday); without a date, from today in the salon's zone, which is asked first.
 */
async function bookOver(db: Db, salonId: string, date: string | undefined, count: number, start = (d: string) => d) {
  let first = date && start(date);
  const at = await salonAtBookVersion(db, { id: salonId }, first ? daysFrom(first, count) : (zone) => daysFrom((first = start(todayIn(zone))), count));
  return { at, first: first! };
}

export function registerBookingRoutes({ table, db, readCache }: AppDeps): void {
  // Calendar reads are answered from the read cache while the book over their dates stands still.
  apiRoute(
    table,
    { method: 'get', path: apiPaths.deskDay, access: DESK, summary: "The salon's book for one day", query: DayQuerySchema, response: DayViewSchema },
    async ({ user, query }) => {
      const { at, first: date } = await bookOver(db, user.salonId, query.date, 1);
      return cachedBookRead(readCache, at, `desk-day|${date}`, () => deskDay(db, toSalon(at.salon), date));
    },
  );
  apiRoute(
    table,
    { method: 'get', path: apiPaths.deskWeek, access: DESK, summary: 'A week of the book, for one stylist or all', query: WeekQuerySchema, response: WeekViewSchema },
    async ({ user, query }) => {
      const { at, first: monday } = await bookOver(db, user.salonId, query.date, 7, mondayOf);
      return cachedBookRead(readCache, at, `desk-week|${monday}|${query.stylistId ?? 'all'}`, () => deskWeek(db, toSalon(at.salon), monday, query.stylistId));
    },
  );
  apiRoute(
    table,
    { method: 'get', path: apiPaths.stylistDay, access: ['stylist'], summary: "The signed-in stylist's day", query: DayQuerySchema, response: DayViewSchema },
    async ({ user, query }) => {
      const { at, first: date } = await bookOver(db, user.salonId, query.date, 1);
      return cachedBookRead(readCache, at, `stylist-day|${user.id}|${date}`, () => stylistDay(db, toSalon(at.salon), user.id, date));
    },
  );
  apiRoute(
    table,
    { method: 'get', path: apiPaths.myBookings, access: ['client'], summary: "The signed-in client's bookings", response: MyBookingsSchema },
    async ({ user }) => {
      const salon = await findSalon(db, user.salonId);
      const clientId = await findClientIdForUser(db, user.id);
      const bookings = clientId
        ? await loadBookingViews(db, { salonId: salon.id, clientId, statuses: BookingStatusSchema.options }, salon.timeZone)
        : [];
      return { timeZone: salon.timeZone, bookings };
    },
  );
  apiRoute(
    table,
    { method: 'get', path: '/api/bookings/:id', access: 'signed_in', summary: 'One booking (staff of its salon, or its own client)', params: IdParamsSchema, response: BookingViewSchema },
    async ({ user, params }) => {
      const salon = await findSalon(db, user.salonId);
      // A client may only see their own bookings; a stylist only the ones they work on. Anything else is
      // answered exactly like a booking that does not exist, so ids cannot be probed.
      const scope =
        user.role === 'client'
          ? { clientId: (await findClientIdForUser(db, user.id)) ?? '00000000-0000-0000-0000-000000000000' }
          : user.role === 'stylist'
            ? { stylistId: (await findStaffIdForUser(db, user.id)) ?? '00000000-0000-0000-0000-000000000000' }
            : {};
      const [booking] = await loadBookingViews(
        db,
        { salonId: salon.id, bookingId: params.id, statuses: BookingStatusSchema.options, ...scope },
        salon.timeZone,
      );
      if (!booking) throw notFound('That booking');
      return booking;
    },
  );
}
