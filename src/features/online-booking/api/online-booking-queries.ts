import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { AvailabilitySchema, ConfirmationSendsSchema, HoldSchema, MyHoldsSchema } from '../../../../shared/schemas/online-booking.schemas';
import { apiGet, withQuery } from '../../../lib/api-client';

export type AvailabilityAsk = { serviceId: string; stylistId?: string; from?: string };

export const onlineBookingQueries = {
  all: () => ['online-booking'] as const,
  availabilities: () => [...onlineBookingQueries.all(), 'availability'] as const,
  availability: (slug: string, ask: AvailabilityAsk) =>
    queryOptions({
      queryKey: [...onlineBookingQueries.availabilities(), slug, ask] as const,
      queryFn: () => apiGet(withQuery(apiPaths.publicAvailability(slug), ask), AvailabilitySchema),
      // Other clients book all the time: a short staleness keeps the list honest without refetching on every focus.
      staleTime: 15_000,
    }),
  /** The signed-in client's unpaid hold (at most one): offered to resume or release instead of holding another. */
  myHolds: () =>
    queryOptions({
      queryKey: [...onlineBookingQueries.all(), 'my-holds'] as const,
      queryFn: () => apiGet(apiPaths.myHolds, MyHoldsSchema),
      staleTime: 0,
    }),
  /** How the booking's confirmation stands per channel (a text may wait for quiet hours). */
  confirmation: (bookingId: string) =>
    queryOptions({
      queryKey: [...onlineBookingQueries.all(), 'confirmation', bookingId] as const,
      queryFn: () => apiGet(apiPaths.myConfirmation(bookingId), ConfirmationSendsSchema),
      staleTime: 0,
    }),
  hold: (holdId: string) =>
    queryOptions({
      queryKey: [...onlineBookingQueries.all(), 'hold', holdId] as const,
      queryFn: () => apiGet(apiPaths.hold(holdId), HoldSchema),
      staleTime: 0,
    }),
};
