import { bookingsApi } from '@shared/api/bookings.api';
import { apiQuery } from '@client/lib/api-client';

// No date means "today in the salon's zone", decided by the server.
export const dayQueries = {
  desk: (date?: string) => apiQuery(bookingsApi.deskDay, { query: { date } }),
  stylist: (date?: string) => apiQuery(bookingsApi.stylistDay, { query: { date } }),
};
