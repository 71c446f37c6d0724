import { onlineBookingApi } from '@shared/api/online-booking.api';
import { apiQuery } from '@client/lib/api-client';

export const publicSalonQueries = {
  // The menu and policies change rarely; free times are fetched separately and fresh.
  bySlug: (slug: string) => ({ ...apiQuery(onlineBookingApi.publicSalon, { params: { slug } }), staleTime: 10 * 60_000 }),
};
