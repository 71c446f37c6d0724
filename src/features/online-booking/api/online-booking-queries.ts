import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { AvailabilitySchema, HoldSchema } from '../../../../shared/schemas/online-booking.schemas';
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
  hold: (holdId: string) =>
    queryOptions({
      queryKey: [...onlineBookingQueries.all(), 'hold', holdId] as const,
      queryFn: () => apiGet(apiPaths.hold(holdId), HoldSchema),
      staleTime: 0,
    }),
};
