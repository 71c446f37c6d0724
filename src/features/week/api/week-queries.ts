import { bookingsApi } from '@shared/api/bookings.api';
import { apiQuery } from '@client/lib/api-client';

export const weekQueries = {
  desk: (date?: string, stylistId?: string) => apiQuery(bookingsApi.deskWeek, { query: { date, stylistId } }),
};
