import { standbyApi } from '../../../../shared/api/standby.api';
import { apiQuery } from '../../../lib/api-client';

export const standbyQueries = {
  list: () => apiQuery(standbyApi.list),
};
