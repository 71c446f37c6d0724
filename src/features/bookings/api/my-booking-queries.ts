import { onlineBookingApi } from '@shared/api/online-booking.api';
import { apiQuery } from '@client/lib/api-client';

/** A client's own bookings: what cancelling would mean now, and the times a booking could move to. */
export const myBookingQueries = {
  // Terms depend on the clock (the cancellation window), so they are read fresh each time they are shown.
  cancelTerms: (id: string) => ({ ...apiQuery(onlineBookingApi.myCancelTerms, { params: { id } }), staleTime: 0 }),
  moveTimes: (id: string, from?: string) => ({ ...apiQuery(onlineBookingApi.myMoveTimes, { params: { id }, query: { from } }), staleTime: 15_000 }),
};
