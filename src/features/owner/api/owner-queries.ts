import { ownerApi } from '../../../../shared/api/owner.api';
import { apiQuery } from '../../../lib/api-client';

export const ownerQueries = {
  overview: () => apiQuery(ownerApi.overview),
};
