import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { OwnerOverviewSchema } from '../../../../shared/schemas/owner.schemas';
import { apiGet } from '../../../lib/api-client';

export const ownerQueries = {
  all: () => ['owner'] as const,
  overview: () =>
    queryOptions({
      queryKey: [...ownerQueries.all(), 'overview'] as const,
      queryFn: () => apiGet(apiPaths.ownerOverview, OwnerOverviewSchema),
    }),
};
