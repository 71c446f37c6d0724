import { salonApi } from '@shared/api/salon.api';
import { apiQuery } from '@client/lib/api-client';

export const salonQueries = {
  current: () => ({ ...apiQuery(salonApi.current), staleTime: 10 * 60_000 }),
};
