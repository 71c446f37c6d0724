import { firstLoadAddresses } from '@shared/api/first-load-addresses';
import { apiQuery } from '@client/lib/api-client';

export const publicSalonQueries = {
  // The menu and policies change rarely; free times are fetched separately and fresh.
  bySlug: (slug: string) => ({ ...apiQuery(firstLoadAddresses.publicSalon, { params: { slug } }), staleTime: 10 * 60_000 }),
};
