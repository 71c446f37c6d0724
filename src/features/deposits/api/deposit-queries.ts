import { paymentsApi } from '@shared/api/payments.api';
import { apiQuery } from '@client/lib/api-client';

export const depositQueries = {
  /** A booking's deposit at the desk: where it stands, its movements and requests. */
  ofBooking: (bookingId: string) => apiQuery(paymentsApi.deposit, { params: { id: bookingId } }),
  // Read afresh: the client may pay (or the desk take it) at any moment.
  byToken: (token: string) => ({ ...apiQuery(paymentsApi.depositRequest, { params: { token } }), staleTime: 0 }),
};
