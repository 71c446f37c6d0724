import { ownerApi } from '@shared/api/owner.api';
import { apiQuery } from '@client/lib/api-client';

export const ownerQueries = {
  overview: () => apiQuery(ownerApi.overview),
};
