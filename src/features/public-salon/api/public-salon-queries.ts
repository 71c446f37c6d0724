import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { PublicSalonSchema } from '../../../../shared/schemas/online-booking.schemas';
import { apiGet } from '../../../lib/api-client';

export const publicSalonQueries = {
  all: () => ['public-salon'] as const,
  bySlug: (slug: string) =>
    queryOptions({
      queryKey: [...publicSalonQueries.all(), slug] as const,
      queryFn: () => apiGet(apiPaths.publicSalon(slug), PublicSalonSchema),
      // The menu and policies change rarely; free times are fetched separately and fresh.
      staleTime: 10 * 60_000,
    }),
};
