import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { WeekViewSchema } from '../../../../shared/schemas/booking-view.schemas';
import { apiGet, withQuery } from '../../../lib/api-client';

export const weekQueries = {
  all: () => ['week'] as const,
  desk: (date?: string, stylistId?: string) =>
    queryOptions({
      queryKey: [...weekQueries.all(), date ?? 'this', stylistId ?? 'all'] as const,
      queryFn: () => apiGet(withQuery(apiPaths.deskWeek, { date, stylistId }), WeekViewSchema),
    }),
};
