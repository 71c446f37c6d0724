import { onlineBookingApi } from '@shared/api/online-booking.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { cancelMyBooking, cancelTerms, moveMyBooking, myBookingCalendarFile, myMoveTimes } from './my-bookings.service';
import { confirmationSends } from './confirmation';
import { makeDecidedRefunds } from '../payments';

export function registerMyBookingRoutes({ table, db, payments }: AppDeps): void {
  apiRoute(table, onlineBookingApi.calendarFile, async ({ user, params, res }) => {
    res
      .type('text/calendar')
      .attachment('booking.ics')
      .send(await myBookingCalendarFile(db, user, params.id));
  });
  apiRoute(table, onlineBookingApi.confirmation, ({ user, params }) => confirmationSends(db, user, params.id, new Date()));
  apiRoute(table, onlineBookingApi.myCancelTerms, ({ user, params }) => cancelTerms(db, user, params.id, new Date()));
  apiRoute(table, onlineBookingApi.myCancel, async ({ user, params, body }) => {
    const answer = await cancelMyBooking(db, user, params.id, body.reason, new Date());
    await makeDecidedRefunds(db, payments); // a deposit the cancellation refunds goes back to the card now
    return answer;
  });
  apiRoute(table, onlineBookingApi.myMoveTimes, ({ user, params, query }) => myMoveTimes(db, user, params.id, query.from, new Date()));
  apiRoute(table, onlineBookingApi.myMove, ({ user, params, body }) => moveMyBooking(db, user, params.id, new Date(body.start), new Date()));
}
