import { clientsApi } from '@shared/api/clients.api';
import { apiQuery } from '@client/lib/api-client';

export const clientQueries = {
  list: (q: string) => apiQuery(clientsApi.list, { query: { q } }),
  detail: (id: string) => apiQuery(clientsApi.one, { params: { id } }),
};
