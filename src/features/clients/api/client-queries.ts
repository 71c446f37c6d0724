import { queryOptions } from '@tanstack/react-query';
import { apiPaths } from '../../../../shared/api/api-paths';
import { ClientDetailSchema, ClientListSchema } from '../../../../shared/schemas/client.schemas';
import { apiGet, withQuery } from '../../../lib/api-client';

export const clientQueries = {
  all: () => ['clients'] as const,
  lists: () => [...clientQueries.all(), 'list'] as const,
  list: (q: string) =>
    queryOptions({
      queryKey: [...clientQueries.lists(), q] as const,
      queryFn: () => apiGet(withQuery(apiPaths.clients, { q }), ClientListSchema),
    }),
  detail: (id: string) =>
    queryOptions({
      queryKey: [...clientQueries.all(), 'detail', id] as const,
      queryFn: () => apiGet(apiPaths.client(id), ClientDetailSchema),
    }),
};
