import { onlineBookingApi } from '@shared/api/online-booking.api';
import { apiQuery } from '@client/lib/api-client';

export type AvailabilityAsk = { serviceId: string; stylistId?: string; from?: string };

export const onlineBookingQueries = {
  availability: (slug: string, ask: AvailabilityAsk) => ({
    ...apiQuery(onlineBookingApi.availability, { params: { slug }, query: ask }),
    // Other clients book all the time: a short staleness keeps the list honest without refetching on every focus.
    staleTime: 15_000,
  }),
  /** The signed-in client's unpaid hold (at most one): offered to resume or release instead of holding another. */
  myHolds: () => ({ ...apiQuery(onlineBookingApi.myHolds), staleTime: 0 }),
  /** How the booking's confirmation stands per channel (a text may wait for quiet hours). */
  confirmation: (bookingId: string) => ({ ...apiQuery(onlineBookingApi.confirmation, { params: { id: bookingId } }), staleTime: 0 }),
  hold: (holdId: string) => ({ ...apiQuery(onlineBookingApi.hold, { params: { id: holdId } }), staleTime: 0 }),
};
