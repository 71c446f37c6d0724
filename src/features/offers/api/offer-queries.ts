import { offersApi } from '@shared/api/windows.api';
import { apiQuery } from '@client/lib/api-client';

export const offerQueries = {
  // Always read afresh: someone else may take the time at any moment.
  byToken: (token: string) => ({ ...apiQuery(offersApi.view, { params: { token } }), staleTime: 0 }),
};
