import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { WindowListSchema } from '../../../../shared/schemas/window.schemas';
import { apiGet, withQuery } from '../../../lib/api-client';

export const windowQueries = {
  all: () => ['windows'] as const,
  /** A stylist always gets their own windows; the desk gets every stylist's, or one's. */
  list: (date?: string, stylistId?: string) =>
    queryOptions({
      queryKey: [...windowQueries.all(), date ?? 'today', stylistId ?? 'all'] as const,
      queryFn: () => apiGet(withQuery(apiPaths.windows, { date, stylistId }), WindowListSchema),
      // Windows open and close as bookings change: keep them fresh on the stylist's screen.
      staleTime: 15_000,
    }),
};
