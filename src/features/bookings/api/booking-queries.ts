import { bookingsApi } from '@shared/api/bookings.api';
import { queryOptions } from '@tanstack/react-query';
import type { BookingOptionsRequest } from '@shared/schemas/booking.schemas';
import { apiKey, apiQuery, callApi } from '@client/lib/api-client';

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
  /**
   * The engine's options for one request. A read sent as a POST only because a step plan is too large for a query
   * string, so it is cached by the request itself: asking again for the same thing shows the answer at once while
   * it is read fresh, and any change to the book makes every cached answer stale (cache-rules.ts).
   */
  options: (request: BookingOptionsRequest) =>
    queryOptions({
      queryKey: [...apiKey(bookingsApi.options), request] as const,
      queryFn: () => callApi(bookingsApi.options, { body: request }),
      // A refused request (a field to fix) is answered the same way every time.
      retry: false,
    }),
  // Terms depend on the clock (the cancellation window), so they are read fresh each time they are shown.
  cancelTerms: (id: string) => ({ ...apiQuery(bookingsApi.cancelTerms, { params: { id } }), staleTime: 0 }),
};
