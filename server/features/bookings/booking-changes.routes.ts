import { bookingsApi } from '@shared/api/bookings.api';
import type { AppDeps } from '@server/app-deps';
import { apiRoute } from '@server/lib/api-route';
import { makeDecidedRefunds } from '../payments';
import { bookingHistory } from './booking-view.service';
import { bookAtDesk, cancelAtDesk, cancelTermsAtDesk, changePlanAtDesk, deskBookingOptions, moveAtDesk, moveTimesAtDesk } from './booking-changes.service';

export function registerBookingChangeRoutes({ table, db, payments }: AppDeps): void {
  apiRoute(table, bookingsApi.options, ({ user, body }) => deskBookingOptions(db, user, body, new Date()));
  apiRoute(table, bookingsApi.create, ({ user, body }) => bookAtDesk(db, user, body, new Date()));
  apiRoute(table, bookingsApi.move, ({ user, params, body }) => moveAtDesk(db, user, params.id, body, new Date()));
  apiRoute(table, bookingsApi.changePlan, ({ user, params, body }) => changePlanAtDesk(db, user, params.id, body, new Date()));
  apiRoute(table, bookingsApi.moveTimes, ({ user, params, query }) => moveTimesAtDesk(db, user, params.id, query, new Date()));
  apiRoute(table, bookingsApi.cancelTerms, ({ user, params }) => cancelTermsAtDesk(db, user, params.id, new Date()));
  apiRoute(table, bookingsApi.cancel, async ({ user, params, body }) => {
    const answer = await cancelAtDesk(db, user, params.id, body.reason, new Date());
    await makeDecidedRefunds(db, payments); // a deposit the cancellation refunds goes back to the card now
    return answer;
  });
  apiRoute(table, bookingsApi.history, ({ user, params }) => bookingHistory(db, user, params.id));
}
