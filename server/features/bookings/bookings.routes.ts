import { bookingsApi } from '@shared/api/bookings.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { cachedDeskDay, cachedDeskWeek, cachedStylistDay } from './calendar-reads.service';
import { myBookings, visibleBooking } from './booking-view.service';

export function registerBookingRoutes({ table, db, readCache }: AppDeps): void {
  apiRoute(table, bookingsApi.deskDay, ({ user, query }) => cachedDeskDay(db, readCache, user, query.date));
  apiRoute(table, bookingsApi.deskWeek, ({ user, query }) => cachedDeskWeek(db, readCache, user, query.date, query.stylistId));
  apiRoute(table, bookingsApi.stylistDay, ({ user, query }) => cachedStylistDay(db, readCache, user, query.date));
  apiRoute(table, bookingsApi.mine, ({ user }) => myBookings(db, user));
  apiRoute(table, bookingsApi.one, ({ user, params }) => visibleBooking(db, user, params.id));
}
