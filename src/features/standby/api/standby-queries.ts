import { standbyApi } from '@shared/api/standby.api';
import { apiQuery } from '@client/lib/api-client';

export const standbyQueries = {
  list: () => apiQuery(standbyApi.list),
};
