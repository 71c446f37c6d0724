import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { ServiceListSchema, StylistListSchema } from '../../../../shared/schemas/service.schemas';
import { apiGet } from '../../../lib/api-client';

/** The salon's menu and its stylists: change rarely, read on most desk pages. */
export const catalogueQueries = {
  all: () => ['catalogue'] as const,
  services: () =>
    queryOptions({
      queryKey: [...catalogueQueries.all(), 'services'] as const,
      queryFn: () => apiGet(apiPaths.services, ServiceListSchema),
      staleTime: 5 * 60_000,
    }),
  stylists: () =>
    queryOptions({
      queryKey: [...catalogueQueries.all(), 'stylists'] as const,
      queryFn: () => apiGet(apiPaths.stylists, StylistListSchema),
      staleTime: 5 * 60_000,
    }),
};
