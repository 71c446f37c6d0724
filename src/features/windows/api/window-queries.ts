import { windowsApi } from '@shared/api/windows.api';
import { apiQuery } from '@client/lib/api-client';

export const windowQueries = {
  /** A stylist always gets their own windows; the desk gets every stylist's, or one's. */
  list: (date?: string, stylistId?: string) => ({
    ...apiQuery(windowsApi.list, { query: { date, stylistId } }),
    // Windows open and close as bookings change: keep them fresh on the stylist's screen.
    staleTime: 15_000,
  }),
};
