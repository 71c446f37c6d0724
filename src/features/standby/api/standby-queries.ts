import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { StandbyListSchema } from '../../../../shared/schemas/standby.schemas';
import { apiGet } from '../../../lib/api-client';

export const standbyQueries = {
  all: () => ['standby'] as const,
  list: () =>
    queryOptions({
      queryKey: [...standbyQueries.all(), 'list'] as const,
      queryFn: () => apiGet(apiPaths.standby, StandbyListSchema),
    }),
};
