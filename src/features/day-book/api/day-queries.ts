import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { DayViewSchema } from '../../../../shared/schemas/booking-view.schemas';
import { apiGet, withQuery } from '../../../lib/api-client';

// No date means "today in the salon's zone", decided by the server.
const dateKey = (date?: string) => date ?? 'today';

export const dayQueries = {
  all: () => ['day'] as const,
  desk: (date?: string) =>
    queryOptions({
      queryKey: [...dayQueries.all(), 'desk', dateKey(date)] as const,
      queryFn: () => apiGet(withQuery(apiPaths.deskDay, { date }), DayViewSchema),
    }),
  stylist: (date?: string) =>
    queryOptions({
      queryKey: [...dayQueries.all(), 'stylist', dateKey(date)] as const,
      queryFn: () => apiGet(withQuery(apiPaths.stylistDay, { date }), DayViewSchema),
    }),
};
