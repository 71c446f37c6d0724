import { bookingsApi } from '../../../../shared/api/bookings.api';
import { apiQuery } from '../../../lib/api-client';

export const bookingQueries = {
  /** The signed-in client's own bookings. */
  mine: () => apiQuery(bookingsApi.mine),
  one: (id: string) => apiQuery(bookingsApi.one, { params: { id } }),
  history: (id: string) => apiQuery(bookingsApi.history, { params: { id } }),
  /** Free times to move one sitting to (a change to the booking refreshes them). */
  moveTimes: (id: string, ask: { sitting: number; stylistId?: string; from?: string }) => ({
    ...apiQuery(bookingsApi.moveTimes, { params: { id }, query: { sitting: String(ask.sitting), stylistId: ask.stylistId, from: ask.from } }),
    staleTime: 15_000,
  }),
  // Terms depend on the clock (the cancellation window), so they are read fresh each time they are shown.
  cancelTerms: (id: string) => ({ ...apiQuery(bookingsApi.cancelTerms, { params: { id } }), staleTime: 0 }),
};
