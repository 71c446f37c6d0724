import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { SalonSchema } from '../../../../shared/schemas/salon.schemas';
import { apiGet } from '../../../lib/api-client';

export const salonQueries = {
  all: () => ['salon'] as const,
  current: () =>
    queryOptions({
      queryKey: [...salonQueries.all(), 'current'] as const,
      queryFn: () => apiGet(apiPaths.salon, SalonSchema),
      staleTime: 10 * 60_000,
    }),
};
